import type { HistoryEntry } from '@/shared/api/build';
import type { Models } from '@/server/models';
import { loadPeople, toCableMark, toStepMark } from './dto';

/**
 * Every mark of a version, cable and step marks together, oldest first. Each table is read in
 * commit order (row id); the two are merged by time, a cable mark first when two share a
 * millisecond. Nothing is ever removed, so the list only grows.
 */
export async function readHistory(models: Models, versionId: number): Promise<HistoryEntry[]> {
  const [cables, steps] = await Promise.all([
    models.BuildMark.findAll({ where: { versionId }, order: [['id', 'ASC']] }),
    models.BuildStepMark.findAll({ where: { versionId }, order: [['id', 'ASC']] }),
  ]);
  const people = await loadPeople(models, [...cables, ...steps].map((m) => m.authorId));
  const out: HistoryEntry[] = [];
  let i = 0;
  let j = 0;
  while (i < cables.length || j < steps.length) {
    const takeCable = j >= steps.length || (i < cables.length && cables[i].createdAt.getTime() <= steps[j].createdAt.getTime());
    if (takeCable) out.push({ kind: 'cable', ...toCableMark(cables[i++], people) });
    else out.push({ kind: 'step', ...toStepMark(steps[j++], people) });
  }
  return out;
}
