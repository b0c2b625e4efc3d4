import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { harborRoadV1, harborRoadV2 } from '@/shared/fixtures/harbor-road';

/**
 * Writes the demo fixtures from their builders: `npx tsx shared/cli/build-fixtures.ts`.
 * A test checks the committed files still equal what the builders make.
 */
const folder = join(__dirname, '..', 'fixtures');
const files = { 'harbor-road-v1.json': harborRoadV1(), 'harbor-road-v2.json': harborRoadV2() };
for (const [name, doc] of Object.entries(files)) {
  writeFileSync(join(folder, name), `${JSON.stringify(doc, null, 2)}\n`);
  process.stdout.write(`wrote shared/fixtures/${name}\n`);
}
