import type { Sequelize } from 'sequelize';
import type { BuildRecord, CableStatus, Photo, StepStatus } from '@/shared/api/build';
import { buildProgress } from '@/shared/build/progress';
import { emptyRecord, ownValue, type IdRecord } from '@/shared/keys/record';
import type { Models } from '@/server/models';
import { toPerson } from '@/server/services/designs/dto';
import { loadPeople, toPhoto } from './dto';
import { latestCableMarks, latestStepMarks } from './latest';
import { supersededBy, type OpenedBuild } from './open';
import type { VersionCache } from './version-cache';

/**
 * The whole build record of a version as GET …/build answers it: every cable and step with its
 * current state, the photos per cable and per rack, progress and completion.
 * Records are keyed by ids (user text), so they are made without a prototype.
 */
export async function readRecord(deps: { models: Models; sequelize: Sequelize; versions: VersionCache }, opened: OpenedBuild): Promise<BuildRecord> {
  const { models, sequelize } = deps;
  const { view, record, doc } = opened;
  const versionId = record.row.id;
  const plan = await deps.versions.plan(versionId, doc);
  const [marks, stepMarks, photos, completion] = await Promise.all([
    latestCableMarks(models, sequelize, versionId),
    latestStepMarks(models, sequelize, versionId),
    models.BuildPhoto.findAll({ where: { versionId }, order: [['createdAt', 'ASC'], ['id', 'ASC']] }),
    models.BuildCompletion.findOne({ where: { versionId } }),
  ]);
  const people = await loadPeople(models, [...marks, ...stepMarks, ...photos].map((row) => row.authorId));
  const name = (id: number) => toPerson(people, id);

  const cables = emptyRecord<CableStatus>();
  for (const cable of doc.cables) cables[cable.id] = { state: 'not-started', note: null, by: null, at: null };
  for (const m of marks) {
    if (ownValue(cables, m.cableId)) cables[m.cableId] = { state: m.state, note: m.note, by: name(m.authorId), at: m.createdAt.toISOString() };
  }
  const steps = emptyRecord<StepStatus>();
  for (const step of plan.steps) steps[step.id] = { done: false, note: null, by: null, at: null };
  for (const m of stepMarks) {
    if (ownValue(steps, m.stepId)) steps[m.stepId] = { done: m.done, note: m.note, by: name(m.authorId), at: m.createdAt.toISOString() };
  }

  const progress = buildProgress(doc, plan.steps, (id) => ownValue(cables, id)?.state ?? 'not-started', (id) => ownValue(steps, id)?.done ?? false);
  return {
    designId: view.design.id,
    number: record.row.number,
    accepting: record.state === 'approved',
    supersededBy: supersededBy(view, record.row.number),
    cables,
    steps,
    photos: groupPhotos(photos.map((p) => toPhoto(p, people))),
    progress,
    complete: progress.cables.done === progress.cables.total && progress.steps.done === progress.steps.total,
    completedAt: completion ? completion.createdAt.toISOString() : null,
  };
}

function groupPhotos(photos: Photo[]): BuildRecord['photos'] {
  const cables = emptyRecord<Photo[]>();
  const racks = emptyRecord<Photo[]>();
  const add = (record: IdRecord<Photo[]>, key: string, photo: Photo) => {
    const list = ownValue(record, key);
    if (list) list.push(photo);
    else record[key] = [photo];
  };
  for (const photo of photos) {
    if (photo.cableId !== null) add(cables, photo.cableId, photo);
    if (photo.rackId !== null) add(racks, photo.rackId, photo);
  }
  return { cables, racks };
}
