import { fork, type ChildProcess } from 'node:child_process';
import { getPriority, setPriority } from 'node:os';
import path from 'node:path';

/**
 * A small pool of analysis processes with a time limit and a memory limit per task.
 *
 * Processes, not worker threads: V8 treats some runaway allocations as fatal for the whole process
 * ("invalid size", or one allocation far past the heap limit), and a worker thread's resourceLimits
 * cannot catch those, so a hostile document in a thread can still take the server down. In a child
 * process the same failure ends that child only. `--max-old-space-size` is the memory limit; the
 * time limit kills the child (SIGKILL) when a task runs past it. A child that died is replaced on
 * the next task. One task per child at a time; tasks beyond the children wait in a queue of at most
 * `queueMax`, and beyond that are refused as busy, so a flood of saves cannot pile up without end.
 *
 * Children are unreferenced while idle (they never keep the server, a test run or a script alive)
 * and exit by themselves when this process goes away.
 */
export type PoolOptions = {
  /** Absolute path of a TypeScript module that exports `TASKS: Map<name, (input) => result>`. */
  module: string;
  workers: number;
  timeoutMs: number;
  maxOldMb: number;
  queueMax: number;
};

/**
 * Why a task did not finish: `time` and `memory` are the limits; `tampered`: the task changed the
 * process' built-in objects (see child.cjs), so its answer was withheld and the process replaced;
 * `stopped`: anything else that ended its process; `busy`: the queue was full.
 */
export type LimitKind = 'time' | 'memory' | 'tampered' | 'stopped' | 'busy';

export class PoolLimitError extends Error {
  constructor(
    readonly kind: LimitKind,
    message: string,
  ) {
    super(message);
    this.name = 'PoolLimitError';
  }
}

export type Pool = {
  run<T>(task: string, input: unknown): Promise<T>;
  /** For tests and logs: processes started, tasks running, tasks waiting. */
  stats(): { processes: number; running: number; queued: number };
  close(): Promise<void>;
};

type Job = { id: number; task: string; input: unknown; resolve: (value: unknown) => void; reject: (error: Error) => void };
/** `retiring`: it answered its last task and is exiting; no task goes to it. */
type Slot = { child: ChildProcess; ready: boolean; retiring: boolean; job: Job | null; timer: NodeJS.Timeout | null; timedOut: boolean; stderr: string };

const CHILD = path.join(__dirname, 'child.cjs');
const ROOT = path.resolve(__dirname, '..', '..');
const STDERR_KEPT = 8192;
const OUT_OF_MEMORY = /heap out of memory|Reached heap limit|Allocation failed|invalid size error|invalid table size|invalid array length/i;

export function createPool(options: PoolOptions): Pool {
  const slots = new Set<Slot>();
  const queue: Job[] = [];
  let nextId = 1;
  let closed = false;

  function spawn(): void {
    const child = fork(CHILD, [options.module], {
      cwd: ROOT,
      env: { ...process.env, TSX_TSCONFIG_PATH: path.join(ROOT, 'tsconfig.json') },
      execArgv: [`--max-old-space-size=${options.maxOldMb}`],
      serialization: 'advanced',
      stdio: ['ignore', 'ignore', 'pipe', 'ipc'],
    });
    lowerPriority(child);
    const slot: Slot = { child, ready: false, retiring: false, job: null, timer: null, timedOut: false, stderr: '' };
    slots.add(slot);
    child.stderr?.setEncoding('utf8');
    child.stderr?.on('data', (chunk: string) => {
      slot.stderr = (slot.stderr + chunk).slice(-STDERR_KEPT);
    });
    child.on('message', (message: { ready?: true; id?: number; result?: unknown; error?: string; tampered?: true }) => {
      if (message.ready) {
        slot.ready = true;
        idle(slot);
        pump();
        return;
      }
      const job = slot.job;
      if (!job || message.id !== job.id) return;
      finish(slot);
      if (message.tampered) {
        // The child exits by itself and is replaced then; until it has, no task goes to it.
        slot.retiring = true;
        job.reject(new PoolLimitError('tampered', 'the task changed built-in objects of its process'));
      } else if (message.error !== undefined) job.reject(new Error(message.error));
      else job.resolve(message.result);
      pump();
    });
    child.on('error', (error) => ended(slot, error.message));
    child.on('exit', (code, signal) => ended(slot, `exit ${signal ?? code}`));
    // Started because a task waits for it: referenced until it is ready and has taken that task.
    busy(slot);
  }

  function ended(slot: Slot, how: string): void {
    if (!slots.delete(slot)) return;
    if (slot.timer) clearTimeout(slot.timer);
    const job = slot.job;
    slot.job = null;
    if (!slot.ready && !closed) {
      // It died while loading: starting more would fail the same way. Say why once, refuse what waits.
      console.error(`An analysis process could not start (${how}):\n${slot.stderr.trim()}`);
      for (const waiting of queue.splice(0)) waiting.reject(new PoolLimitError('stopped', 'the analysis processes cannot start'));
    }
    if (job) job.reject(limitOf(slot, how));
    // A process lost to a limit is replaced at once, so the next save does not wait for one to start.
    if (slot.ready && !closed && slots.size < options.workers && ![...slots].some((s) => !s.ready)) spawn();
    pump();
  }

  function limitOf(slot: Slot, how: string): PoolLimitError {
    if (slot.timedOut) return new PoolLimitError('time', `ran longer than ${options.timeoutMs} ms`);
    if (OUT_OF_MEMORY.test(slot.stderr)) return new PoolLimitError('memory', `needed more than ${options.maxOldMb} MB`);
    return new PoolLimitError('stopped', `the analysis process stopped (${how})`);
  }

  function dispatch(slot: Slot, job: Job): void {
    slot.job = job;
    busy(slot);
    slot.timer = setTimeout(() => {
      slot.timedOut = true;
      slot.child.kill('SIGKILL');
    }, options.timeoutMs);
    slot.child.send({ id: job.id, task: job.task, input: job.input }, (error) => {
      if (!error || slot.job !== job) return;
      finish(slot);
      job.reject(error);
      pump();
    });
  }

  function finish(slot: Slot): void {
    if (slot.timer) clearTimeout(slot.timer);
    slot.timer = null;
    slot.job = null;
    idle(slot);
  }

  function pump(): void {
    while (queue.length > 0 && !closed) {
      const free = [...slots].find((s) => s.ready && !s.retiring && !s.job);
      if (free) {
        dispatch(free, queue.shift()!);
        continue;
      }
      const starting = [...slots].some((s) => !s.ready);
      if (!starting && slots.size < options.workers) spawn();
      return;
    }
  }

  return {
    run<T>(task: string, input: unknown): Promise<T> {
      if (closed) return Promise.reject(new PoolLimitError('stopped', 'the analysis pool is closed'));
      if (queue.length >= options.queueMax) return Promise.reject(new PoolLimitError('busy', 'the analysis queue is full'));
      return new Promise<T>((resolve, reject) => {
        queue.push({ id: nextId++, task, input, resolve: resolve as (value: unknown) => void, reject });
        pump();
      });
    },
    stats() {
      return { processes: slots.size, running: [...slots].filter((s) => s.job).length, queued: queue.length };
    },
    async close() {
      closed = true;
      for (const job of queue.splice(0)) job.reject(new PoolLimitError('stopped', 'the analysis pool is closed'));
      const exits = [...slots].map((slot) => new Promise<void>((resolve) => {
        if (slot.child.exitCode !== null || slot.child.signalCode !== null) return resolve();
        slot.child.once('exit', () => resolve());
        slot.child.kill('SIGKILL');
      }));
      await Promise.all(exits);
    },
  };
}

/**
 * Analysis processes run at a lower scheduling priority (nice 10) than the server: on a busy
 * machine the request thread gets the CPU first, so a large save never slows everyone's reads,
 * while an idle core still goes to the analysis. Where the priority cannot be set, nothing changes.
 */
const ANALYSIS_NICE = 10;
function lowerPriority(child: ChildProcess): void {
  if (child.pid === undefined) return;
  try {
    setPriority(child.pid, Math.min(19, getPriority(child.pid) + ANALYSIS_NICE));
  } catch {
    // Not permitted here (or the process already ended): it runs at the server's priority.
  }
}

/** An idle child must not keep this process alive; a busy one must, or a script awaiting it would exit. */
function idle(slot: Slot): void {
  slot.child.unref();
  slot.child.channel?.unref();
  (slot.child.stderr as unknown as { unref?: () => void } | null)?.unref?.();
}

function busy(slot: Slot): void {
  slot.child.ref();
  slot.child.channel?.ref();
  (slot.child.stderr as unknown as { ref?: () => void } | null)?.ref?.();
}

const shared = new Map<string, Pool>();

/** One pool per set of options for the whole process: every app instance (and every test app) shares it. */
export function sharedPool(options: PoolOptions): Pool {
  const key = JSON.stringify(options);
  let pool = shared.get(key);
  if (!pool) {
    pool = createPool(options);
    shared.set(key, pool);
  }
  return pool;
}

/** Stop every shared pool (server shutdown). */
export async function closeSharedPools(): Promise<void> {
  const pools = [...shared.values()];
  shared.clear();
  await Promise.all(pools.map((p) => p.close()));
}
