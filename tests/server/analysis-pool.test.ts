import { fork } from 'node:child_process';
import { getPriority } from 'node:os';
import path from 'node:path';
import { createPool, PoolLimitError, type Pool } from '@/server/analysis/pool';

/**
 * The pool of analysis processes on its own, with tasks that misbehave on purpose
 * (tests/server/helpers/pool-tasks.ts): each limit ends the task with its own kind of error, the
 * process that hit it is replaced, and this process keeps running its event loop meanwhile.
 */
const TASKS = path.join(__dirname, 'helpers', 'pool-tasks.ts');
let pool: Pool;
afterEach(() => pool.close());

const make = (options: Partial<Parameters<typeof createPool>[0]> = {}) =>
  (pool = createPool({ module: TASKS, workers: 1, timeoutMs: 1500, maxOldMb: 64, queueMax: 4, ...options }));

async function failure(run: Promise<unknown>): Promise<PoolLimitError | Error> {
  try {
    await run;
  } catch (error) {
    return error as Error;
  }
  throw new Error('expected the task to fail');
}

type Echo = { echoed: unknown; pid: number };

/** Whether a process with this id still runs (signal 0 only checks). */
function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

describe('the analysis process pool', () => {
  it('runs its processes at a lower priority than the server, so requests get the CPU first', async () => {
    const { pid } = await make().run<Echo>('echo', 1);
    // POSIX nice values: higher is lower priority, at most 19 (common practice: background work at nice 10).
    expect(getPriority(pid)).toBe(Math.min(19, getPriority() + 10));
  });

  it('runs a task in another process and answers its result', async () => {
    const result = await make().run<Echo>('echo', { ids: ['constructor', '__proto__'] });
    expect(result.echoed).toEqual({ ids: ['constructor', '__proto__'] });
    expect(result.pid).not.toBe(process.pid);
  });

  it('ends a task that runs past the time limit, keeps this event loop free meanwhile, and replaces the process', async () => {
    make();
    const before = await pool.run<Echo>('echo', 1);
    const ticks: number[] = [];
    const timer = setInterval(() => ticks.push(Date.now()), 50);
    const started = Date.now();
    const error = await failure(pool.run('spin', null));
    clearInterval(timer);
    expect(error).toBeInstanceOf(PoolLimitError);
    expect((error as PoolLimitError).kind).toBe('time');
    expect(Date.now() - started).toBeGreaterThanOrEqual(1500);
    // While the other process spun, this one kept ticking: most 50 ms ticks arrived.
    expect(ticks.length).toBeGreaterThan(10);
    const after = await pool.run<Echo>('echo', 2);
    expect(after.pid).not.toBe(before.pid);
  });

  it('ends a task that outgrows the memory limit with a memory error, and the next task still runs', async () => {
    make({ timeoutMs: 30_000 });
    const error = await failure(pool.run('grow', null));
    expect((error as PoolLimitError).kind).toBe('memory');
    expect((await pool.run<Echo>('echo', 'still here')).echoed).toBe('still here');
  });

  it('reports a process that exits mid-task as stopped, and a task that throws as a plain error', async () => {
    make();
    expect((await failure(pool.run('exit', null)) as PoolLimitError).kind).toBe('stopped');
    const thrown = await failure(pool.run('throw', null));
    expect(thrown).not.toBeInstanceOf(PoolLimitError);
    expect(thrown.message).toBe('task failed on purpose');
    expect((await failure(pool.run('no-such-task', null))).message).toMatch(/no task named/);
  });

  it('withholds the answer of a task that changed a built-in prototype, and runs the next task in a clean process', async () => {
    make();
    const error = await failure(pool.run('pollute', 'written-by-a-hostile-id'));
    expect((error as PoolLimitError).kind).toBe('tampered');
    expect(await pool.run<boolean>('inherits', 'written-by-a-hostile-id')).toBe(false);
    // And this process was never touched.
    expect('written-by-a-hostile-id' in {}).toBe(false);
  });

  it('refuses tasks beyond its queue as busy instead of piling them up', async () => {
    make({ timeoutMs: 1000, queueMax: 2 });
    // Both wait while the one process starts: the queue is full.
    const running = [pool.run('spin', null), pool.run('spin', null)];
    const refused = await failure(pool.run('echo', 'one too many'));
    expect((refused as PoolLimitError).kind).toBe('busy');
    const settled = await Promise.allSettled(running);
    expect(settled.map((s) => s.status)).toEqual(['rejected', 'rejected']);
  });

  it('leaves no analysis process spinning when the server is killed outright (kill -9) mid-task', async () => {
    make();
    const parent = fork(path.join(__dirname, 'helpers', 'pool-parent.cjs'), [], { stdio: ['ignore', 'ignore', 'inherit', 'ipc'] });
    const { child } = await new Promise<{ parent: number; child: number }>((resolve) => parent.once('message', resolve as never));
    expect(alive(child)).toBe(true);
    parent.kill('SIGKILL');
    const end = Date.now() + 5000;
    while (alive(child) && Date.now() < end) await new Promise((resolve) => setTimeout(resolve, 100));
    expect(alive(child)).toBe(false);
  });

  it('refuses work once closed', async () => {
    make();
    await pool.run('echo', 1);
    await pool.close();
    expect((await failure(pool.run('echo', 2)) as PoolLimitError).kind).toBe('stopped');
    expect(pool.stats().processes).toBe(0);
  });
});
