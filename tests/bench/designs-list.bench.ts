import { fork } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { rmSync } from 'node:fs';
import http from 'node:http';
import { cpus, loadavg, tmpdir } from 'node:os';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import { analyze } from '@/shared/analysis/analyze';
import { summarize } from '@/shared/analysis/summary';
import harborRoadV2 from '@/shared/fixtures/harbor-road-v2.json';
import type { Topology } from '@/shared/topology/schema';
import { createApp } from '@/server/app';
import { loadConfig } from '@/server/config';
import { openDatabase } from '@/server/db';
import { createMailer } from '@/server/mail/mailer';
import { migrate } from '@/server/migrate';
import { getModels } from '@/server/models';
import { DEMO_PASSWORD, seedDemo } from '@/server/seed';
import { createPasswords } from '@/server/services/passwords';

/**
 * `npm run bench` (designs list): GET /api/designs on a team with 1,000 designs and 20,000 versions
 * (20 each, every version holding the Harbor Road document and its report, as real rows do), some
 * approved, some in review, in a temporary SQLite file. The server runs in a child process; this
 * process sends requests from CONCURRENCY connections for DURATION_MS and reports requests per
 * second and latency percentiles for the first page, a page deep in the list, and a search.
 * Targets: 200 req/s and p99 under 200 ms on the first page. Exits 1 when a target is missed.
 */
const DESIGNS = 1000;
const VERSIONS_PER_DESIGN = 20;
const CONCURRENCY = 8;
const DURATION_MS = 8000;
const TARGET = { rps: 200, p99Ms: 200 };

export async function seed(sequelize: Sequelize): Promise<void> {
  await seedDemo(sequelize, createPasswords(4), { designs: false });
  const models = getModels(sequelize);
  const ravi = (await models.User.findOne({ where: { email: 'ravi@tidewater.example' } }))!;
  const theo = (await models.User.findOne({ where: { email: 'theo@tidewater.example' } }))!;
  const doc = harborRoadV2 as Topology;
  const document = JSON.stringify(doc);
  const report = analyze(doc);
  const reportJson = JSON.stringify(report);
  const summary = JSON.stringify(summarize(report, doc));
  const start = Date.parse('2026-01-05T08:00:00Z');
  await sequelize.transaction(async (transaction) => {
    for (let d = 0; d < DESIGNS; d += 1) {
      const at = (minutes: number) => new Date(start + (d * VERSIONS_PER_DESIGN + minutes) * 60_000);
      const design = await models.Design.create(
        { teamId: ravi.teamId, name: `Cold store ${d + 1}`, site: `Site ${d % 37}`, status: d % 3 === 0 ? 'approved' : 'in-review', createdById: ravi.id, createdAt: at(0), updatedAt: at(VERSIONS_PER_DESIGN) },
        { transaction },
      );
      const rows = await models.DesignVersion.bulkCreate(
        Array.from({ length: VERSIONS_PER_DESIGN }, (_, v) => ({
          designId: design.id,
          number: v + 1,
          document,
          message: `Step ${v + 1} of the layout`,
          authorId: ravi.id,
          summary,
          contentHash: randomBytes(32).toString('hex'),
          report: reportJson,
          createdAt: at(v),
        })),
        { transaction },
      );
      // Every third design has version 10 approved; every design has its latest version in review.
      const events = [{ versionId: rows[VERSIONS_PER_DESIGN - 1].id, actorId: ravi.id, action: 'submit' as const, comment: null, override: false, createdAt: at(VERSIONS_PER_DESIGN) }];
      if (d % 3 === 0) {
        events.push(
          { versionId: rows[9].id, actorId: ravi.id, action: 'submit', comment: null, override: false, createdAt: at(10) },
          { versionId: rows[9].id, actorId: theo.id, action: 'approve' as never, comment: null, override: false, createdAt: at(11) },
        );
      }
      await models.ReviewEvent.bulkCreate(events, { transaction });
    }
  });
}

/** The child: open the seeded file and serve it; tell the parent the port. */
async function serve(file: string): Promise<void> {
  const config = loadConfig({ NODE_ENV: 'test', DATABASE_PATH: file, BCRYPT_COST: '4', SEED: 'none', MAIL: 'fake', PORT: '0', WEB_DIR: '/nonexistent' });
  const sequelize = await openDatabase(file);
  const mailer = await createMailer(config);
  const server = createApp({ sequelize, mailer, config }).listen(0, '127.0.0.1', () => {
    process.send!({ port: (server.address() as { port: number }).port });
  });
  process.on('disconnect', () => process.exit(0));
}

type Answer = { status: number; body: string; headers: http.IncomingHttpHeaders };

function send(agent: http.Agent, port: number, method: string, pathname: string, headers: Record<string, string>, body?: string): Promise<Answer> {
  return new Promise((resolve, reject) => {
    const req = http.request({ host: '127.0.0.1', port, method, path: pathname, agent, headers }, (res) => {
      let text = '';
      res.setEncoding('utf8');
      res.on('data', (chunk) => (text += chunk));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body: text, headers: res.headers }));
    });
    req.on('error', reject);
    req.end(body);
  });
}

type Load = { requests: number; rps: number; p50: number; p95: number; p99: number; max: number };

/** CONCURRENCY loops sending `pathname` until DURATION_MS has passed; latencies from send to last byte. */
async function load(agent: http.Agent, port: number, cookie: string, pathname: string): Promise<Load> {
  const latencies: number[] = [];
  const end = performance.now() + DURATION_MS;
  const started = performance.now();
  await Promise.all(
    Array.from({ length: CONCURRENCY }, async () => {
      while (performance.now() < end) {
        const t0 = performance.now();
        const res = await send(agent, port, 'GET', pathname, { cookie });
        if (res.status !== 200) throw new Error(`GET ${pathname} answered ${res.status}: ${res.body.slice(0, 200)}`);
        latencies.push(performance.now() - t0);
      }
    }),
  );
  const seconds = (performance.now() - started) / 1000;
  latencies.sort((a, b) => a - b);
  const at = (q: number) => latencies[Math.min(latencies.length - 1, Math.floor(q * latencies.length))];
  return { requests: latencies.length, rps: latencies.length / seconds, p50: at(0.5), p95: at(0.95), p99: at(0.99), max: latencies[latencies.length - 1] };
}

async function main(): Promise<void> {
  const file = path.join(tmpdir(), `cw-designs-bench-${process.pid}.sqlite`);
  const seeding = performance.now();
  const sequelize = await openDatabase(file);
  await migrate(sequelize);
  await seed(sequelize);
  await sequelize.close();
  console.log(`designs list benchmark: ${DESIGNS} designs, ${DESIGNS * VERSIONS_PER_DESIGN} versions, seeded in ${((performance.now() - seeding) / 1000).toFixed(1)} s`);

  const child = fork(__filename, ['--serve', file], { execArgv: process.execArgv });
  const port = await new Promise<number>((resolve, reject) => {
    child.once('message', (m) => resolve((m as { port: number }).port));
    child.once('exit', (code) => reject(new Error(`server exited ${code}`)));
  });
  const agent = new http.Agent({ keepAlive: true, maxSockets: CONCURRENCY });
  let ok = true;
  try {
    const signIn = async (email: string) => {
      const res = await send(agent, port, 'POST', '/api/auth/sign-in', { 'content-type': 'application/json' }, JSON.stringify({ email, password: DEMO_PASSWORD }));
      const cookie = String(res.headers['set-cookie']?.[0] ?? '').split(';')[0];
      if (res.status !== 200 || !cookie) throw new Error(`sign-in answered ${res.status}`);
      return cookie;
    };
    const cookie = await signIn('ravi@tidewater.example');
    const installer = await signIn('ines@tidewater.example');

    // A cursor about 800 designs in: page 17 of 20.
    let cursor = '';
    for (let page = 0; page < 16; page += 1) {
      const res = await send(agent, port, 'GET', `/api/designs${cursor ? `?cursor=${cursor}` : ''}`, { cookie });
      cursor = (JSON.parse(res.body) as { nextCursor: string }).nextCursor;
    }
    const cases = [
      { what: 'first page (50 designs)', path: '/api/designs', cookie, target: true },
      { what: 'page 17 (by cursor)', path: `/api/designs?cursor=${cursor}`, cookie, target: false },
      { what: 'search "site 3" (27 matches)', path: '/api/designs?q=site%203', cookie, target: false },
      { what: "installer's first page (approved)", path: '/api/designs', cookie: installer, target: false },
    ];
    const line = (cells: (string | number)[]) => cells.map((c, i) => (i === 0 ? String(c).padEnd(34) : String(c).padStart(10))).join(' ');
    console.log(`${CONCURRENCY} connections, ${DURATION_MS / 1000} s each, server in its own process (node ${process.version})`);
    console.log(line(['request', 'requests', 'req/s', 'p50 ms', 'p95 ms', 'p99 ms', 'max ms']));
    for (const c of cases) {
      const r = await load(agent, port, c.cookie, c.path);
      console.log(line([c.what, r.requests, r.rps.toFixed(0), r.p50.toFixed(1), r.p95.toFixed(1), r.p99.toFixed(1), r.max.toFixed(1)]));
      if (c.target) {
        const met = r.rps >= TARGET.rps && r.p99 < TARGET.p99Ms;
        ok &&= met;
        console.log(`  target: ≥ ${TARGET.rps} req/s and p99 < ${TARGET.p99Ms} ms — ${met ? 'met' : 'MISSED'}`);
      }
    }
    console.log(`load average when done: ${loadavg().map((x) => x.toFixed(2)).join(' ')} on ${cpus().length} cores`);
  } finally {
    agent.destroy();
    child.disconnect();
    await new Promise((resolve) => child.once('exit', resolve));
    for (const suffix of ['', '-wal', '-shm']) rmSync(file + suffix, { force: true });
  }
  process.exitCode = ok ? 0 : 1;
}

if (require.main === module) {
  if (process.argv[2] === '--serve') void serve(process.argv[3]);
  else void main();
}
