import { cpus, loadavg } from 'node:os';
import request from 'supertest';
import { analyze } from '@/shared/analysis/analyze';
import { validateTopology } from '@/shared/topology/validate';
import { closeSharedPools } from '@/server/analysis/pool';
import { makeTestApp } from '../server/helpers/app';
import { designId } from '../server/helpers/designs';
import { syntheticDesign } from './helpers/synthetic';

/**
 * `npm run bench` (save path): issue 14's server rows, on the synthetic two-fabric design.
 * - save a 5,000-host version through the API (body parsed, checked, validated and analysed in one
 *   analysis process, stored with its report): median of SAVES, target < 300 ms;
 * - GET the stored report of that version, and the report screen's one request: median, target < 50 ms;
 * - validation of a 20,000-host document against its analysis, in this process: target ≤ half.
 * The server is in this process (in-memory SQLite, as the server tests), requests over supertest;
 * the body is sent as text, so the timing is the server's work, not this process serialising it.
 * Exits 1 when a target is missed.
 */
const SAVES = 7;
const GETS = 21;
const TARGETS = { saveMs: 300, reportMs: 50, validationShare: 0.5 };

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

/** Collect the answer's bytes without parsing them: the row is the server's time, not this client's JSON.parse. */
function raw(res: request.Response, done: (error: Error | null, body: unknown) => void): void {
  let bytes = 0;
  const stream = res as unknown as NodeJS.ReadableStream;
  stream.on('data', (c: Buffer) => (bytes += c.length));
  stream.on('end', () => done(null, bytes));
}

async function timed<T>(work: () => Promise<T>): Promise<[number, T]> {
  const start = performance.now();
  const value = await work();
  return [performance.now() - start, value];
}

async function apiRows() {
  const t = await makeTestApp({ env: { ANALYSIS_TIMEOUT_MS: '120000' } });
  try {
    const agent = request.agent(t.app);
    await agent.post('/api/auth/sign-in').send({ email: 'ravi@tidewater.example', password: 'harbor-road-demo' }).expect(200);
    const id = await designId(t);
    const body = (base: number) => JSON.stringify({ baseVersion: base, message: 'Bench save', document: syntheticDesign(5000) });
    let base = 2;
    // One save first: it starts the analysis process, which a running server already has.
    const first = await agent.post(`/api/designs/${id}/versions`).type('json').send(body(base));
    if (first.status !== 201) throw new Error(`save answered ${first.status}: ${JSON.stringify(first.body).slice(0, 300)}`);
    base = first.body.version.number;
    const saves: number[] = [];
    for (let i = 0; i < SAVES; i += 1) {
      const text = body(base);
      const [ms, res] = await timed(() => agent.post(`/api/designs/${id}/versions`).type('json').send(text));
      if (res.status !== 201) throw new Error(`save answered ${res.status}`);
      base = res.body.version.number;
      saves.push(ms);
    }
    const reports: number[] = [];
    const pages: number[] = [];
    const brotli: number[] = [];
    for (let i = 0; i < GETS; i += 1) {
      const [ms, res] = await timed(() => agent.get(`/api/designs/${id}/versions/${base}/report`).set('Accept-Encoding', 'identity').buffer(true).parse(raw));
      if (res.status !== 200) throw new Error(`report answered ${res.status}`);
      reports.push(ms);
      const [pageMs, page] = await timed(() => agent.get(`/api/designs/${id}/versions/${base}/report-page`).set('Accept-Encoding', 'identity').buffer(true).parse(raw));
      const [brMs] = await timed(() => agent.get(`/api/designs/${id}/versions/${base}/report`).set('Accept-Encoding', 'br').buffer(true).parse(raw));
      brotli.push(brMs);
      if (page.status !== 200) throw new Error(`report page answered ${page.status}`);
      pages.push(pageMs);
    }
    const [revalidateMs] = await timed(async () => {
      const tag = (await agent.get(`/api/designs/${id}/versions/${base}/report`)).headers.etag;
      const again = await agent.get(`/api/designs/${id}/versions/${base}/report`).set('If-None-Match', tag);
      if (again.status !== 304) throw new Error(`revalidation answered ${again.status}`);
    });
    return { save: median(saves), report: median(reports), page: median(pages), brotli: median(brotli), revalidateMs };
  } finally {
    await t.close();
    await closeSharedPools();
  }
}

function validationRow() {
  const text = JSON.stringify(syntheticDesign(20000));
  const validations: number[] = [];
  const analyses: number[] = [];
  for (let i = 0; i < 3; i += 1) {
    const input = JSON.parse(text) as unknown;
    const start = performance.now();
    const checked = validateTopology(input);
    validations.push(performance.now() - start);
    if (!checked.ok) throw new Error('synthetic design is not valid');
    const began = performance.now();
    analyze(checked.doc);
    analyses.push(performance.now() - began);
  }
  return { validation: median(validations), analysis: median(analyses) };
}

async function main() {
  // Keeps this script's event loop alive while requests wait on the analysis process.
  const alive = setInterval(() => undefined, 1000);
  const api = await apiRows();
  clearInterval(alive);
  const v = validationRow();
  const share = v.validation / v.analysis;
  const rows: [string, string, string, boolean][] = [
    ['save a 5,000-host version (API, median)', `${api.save.toFixed(0)} ms`, `< ${TARGETS.saveMs} ms`, api.save < TARGETS.saveMs],
    ['GET the report of a 5,000-host version (median)', `${api.report.toFixed(1)} ms`, `< ${TARGETS.reportMs} ms`, api.report < TARGETS.reportMs],
    ['GET the report screen of a 5,000-host version (median)', `${api.page.toFixed(1)} ms`, `< ${TARGETS.reportMs} ms`, api.page < TARGETS.reportMs],
    ['validation of 20,000 hosts vs their analysis', `${v.validation.toFixed(0)} / ${v.analysis.toFixed(0)} ms = ${share.toFixed(2)}`, `≤ ${TARGETS.validationShare}`, share <= TARGETS.validationShare],
  ];
  console.log(`save path benchmark (node ${process.version})`);
  for (const [what, got, target, met] of rows) console.log(`${what.padEnd(56)} ${got.padStart(22)}  target ${target.padEnd(9)} ${met ? 'met' : 'MISSED'}`);
  console.log(`the same report brotli-compressed, as a browser asks for it: ${api.brotli.toFixed(1)} ms (median; the compression runs off the request thread)`);
  console.log(`a report revalidated (200 then 304): ${api.revalidateMs.toFixed(1)} ms for both`);
  console.log(`load average when done: ${loadavg().map((x) => x.toFixed(2)).join(' ')} on ${cpus().length} cores`);
  process.exitCode = rows.every((r) => r[3]) ? 0 : 1;
}

void main();
