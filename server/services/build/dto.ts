import { Op, type Transaction } from 'sequelize';
import type { CableMark, Photo, StepMark } from '@/shared/api/build';
import type { Person } from '@/shared/api/designs';
import type { BuildMarkRow, BuildPhotoRow, BuildStepMarkRow, Models, UserRow } from '@/server/models';
import { toPerson } from '@/server/services/designs/dto';

/** The public shapes of build rows; people are named as versions name them (removed members keep their names). */
export type People = Map<number, UserRow>;

export async function loadPeople(models: Models, ids: Iterable<number>, transaction?: Transaction): Promise<People> {
  const unique = [...new Set(ids)];
  if (unique.length === 0) return new Map();
  const users = await models.User.findAll({ where: { id: { [Op.in]: unique } }, transaction });
  return new Map(users.map((u) => [u.id, u]));
}

const person = (people: People, id: number): Person => toPerson(people, id);

export function toCableMark(row: BuildMarkRow, people: People): CableMark {
  return { id: row.id, cableId: row.cableId, state: row.state, note: row.note, by: person(people, row.authorId), at: row.createdAt.toISOString(), clientId: row.clientId };
}

export function toStepMark(row: BuildStepMarkRow, people: People): StepMark {
  return { id: row.id, stepId: row.stepId, done: row.done, note: row.note, by: person(people, row.authorId), at: row.createdAt.toISOString(), clientId: row.clientId };
}

export function toPhoto(row: BuildPhotoRow, people: People): Photo {
  return {
    id: row.id,
    cableId: row.cableId,
    rackId: row.rackId,
    by: person(people, row.authorId),
    at: row.createdAt.toISOString(),
    bytes: row.bytes,
    contentType: row.contentType,
  };
}
