import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';

/**
 * A throwaway Cablewright server for the canvas benchmark: the exported web app, an in-memory
 * database with the demo seed (for an account to sign in with), on the first free port of the
 * benchmark's range.
 */
export const BENCH_PORTS = [8172, 8173, 8174, 8175, 8176, 8177, 8178, 8179];

function free(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const probe = createServer();
    probe.once('error', () => resolve(false));
    probe.listen(port, '127.0.0.1', () => probe.close(() => resolve(true)));
  });
}

export async function freePort(ports = BENCH_PORTS): Promise<number> {
  for (const port of ports) if (await free(port)) return port;
  throw new Error(`no free port among ${ports.join(', ')}`);
}

export type BenchServer = { url: string; stop: () => Promise<void> };

export async function startServer(port: number): Promise<BenchServer> {
  const child: ChildProcess = spawn('npx', ['tsx', 'server/index.ts'], {
    env: { ...process.env, PORT: String(port), DATABASE_PATH: ':memory:', SEED: 'demo', MAIL: 'fake' },
    stdio: ['ignore', 'pipe', 'pipe'],
    detached: true,
  });
  let log = '';
  child.stdout?.on('data', (d) => (log += d));
  child.stderr?.on('data', (d) => (log += d));
  const url = `http://localhost:${port}`;
  const deadline = Date.now() + 90_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the server exited (${child.exitCode}):\n${log}`);
    try {
      const answer = await fetch(`${url}/api/auth/me`);
      if (answer.status === 401) break;
    } catch {
      // Not listening yet.
    }
    if (Date.now() > deadline) throw new Error(`the server did not start within 90 s:\n${log}`);
    await new Promise((r) => setTimeout(r, 500));
  }
  return {
    url,
    stop: () =>
      new Promise((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once('exit', () => resolve());
        // The server runs under npx and tsx: stop the whole group this script started.
        if (child.pid) process.kill(-child.pid, 'SIGTERM');
      }),
  };
}
