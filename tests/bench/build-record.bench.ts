import { analyze } from '@/shared/analysis/analyze';
import { bringUpSteps } from '@/shared/build';
import { buildProgress } from '@/shared/build/progress';
import { validateTopology } from '@/shared/topology/validate';
import { stripJpegLocation } from '@/server/services/photos/metadata';
import { preparePhotoOffThread, closePhotoPool } from '@/server/services/photos/photo-pool';
import { JPEG_8X8 } from '@/tests/server/helpers/build';
import { inRacks } from './helpers/racks';
import { syntheticDesign } from './helpers/synthetic';

/**
 * `npm run bench`: the build record's pure parts on a 5,000-host design in racks — the bring-up
 * checklist (the analysis it needs timed apart) and the progress of a record — and the photo check
 * of a JPEG just under 10 MB, inline and on the worker. Targets: the checklist under 2 s (it is
 * made once per version and kept; most of it is garbage collection of its 18 MB of text), progress
 * under 500 ms (every read of a record), a photo under 1 s on the worker. Median of several runs after a warm-up.
 */
const HOSTS = 5000;
const TARGETS = { checklistMs: 2000, progressMs: 500, photoMs: 1000 };

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

async function time(runs: number, work: () => unknown): Promise<number> {
  await work();
  const times: number[] = [];
  for (let i = 0; i < runs; i += 1) {
    const start = performance.now();
    await work();
    times.push(performance.now() - start);
  }
  return median(times);
}

/** The demo JPEG with a large comment segment's worth of padding after its image data, up to `bytes`. */
function bigJpeg(bytes: number): Buffer {
  const segments: Buffer[] = [];
  const chunk = 65533 - 2;
  const comment = Buffer.alloc(chunk + 4, 0x41);
  comment.writeUInt16BE(0xfffe, 0);
  comment.writeUInt16BE(chunk + 2, 2);
  let size = JPEG_8X8.length;
  while (size + comment.length < bytes) {
    segments.push(comment);
    size += comment.length;
  }
  return Buffer.concat([JPEG_8X8.subarray(0, 2), ...segments, JPEG_8X8.subarray(2)]);
}

export async function benchBuildRecord(): Promise<boolean> {
  console.log('\n== build record ==');
  const checked = validateTopology(inRacks(syntheticDesign(HOSTS)));
  if (!checked.ok) throw new Error('synthetic design is not valid');
  const doc = checked.doc;
  const report = analyze(doc);
  const steps = bringUpSteps(doc, report);
  const checklistMs = await time(5, () => bringUpSteps(doc, report));
  const states = new Map(doc.cables.map((c, i) => [c.id, i % 3 === 0 ? ('tested' as const) : ('run' as const)]));
  const progressMs = await time(5, () => buildProgress(doc, steps, (id) => states.get(id) ?? 'not-started', (id) => id.length % 2 === 0));
  const jpeg = bigJpeg(10 * 1024 * 1024 - 1024);
  const inlineMs = await time(5, () => stripJpegLocation(jpeg));
  const workerMs = await time(3, () => preparePhotoOffThread(jpeg));
  await closePhotoPool();
  console.log(`${HOSTS} hosts: ${doc.cables.length} cables, ${steps.length} bring-up steps`);
  console.log(`checklist     ${checklistMs.toFixed(0).padStart(6)} ms (target < ${TARGETS.checklistMs} ms; the analysis it reads is timed in its own bench)`);
  console.log(`progress      ${progressMs.toFixed(0).padStart(6)} ms (target < ${TARGETS.progressMs} ms)`);
  console.log(`photo ${(jpeg.length / 2 ** 20).toFixed(1)} MB ${inlineMs.toFixed(0).padStart(4)} ms stripped inline, ${workerMs.toFixed(0)} ms judged and stripped on the worker (target < ${TARGETS.photoMs} ms)`);
  const ok = checklistMs < TARGETS.checklistMs && progressMs < TARGETS.progressMs && workerMs < TARGETS.photoMs;
  if (!ok) console.log('build record: a target was missed');
  return ok;
}

if (require.main === module) {
  benchBuildRecord().then((ok) => process.exit(ok ? 0 : 1));
}
