import harborRoadV1 from '@/shared/fixtures/harbor-road-v1.json';
import harborRoadV2 from '@/shared/fixtures/harbor-road-v2.json';
import type { MailMessage } from '@/shared/api/team';
import type { Topology } from '@/shared/topology/schema';
import { addPerson, signInWith, type Agent, type TestApp } from './app';

/**
 * Helpers for the designs, versions and review tests. The seeded demo (server/seed/designs.ts):
 * Tidewater's "Harbor Road storage" v1 (changes asked) and v2 (approved), both by Ravi;
 * Quayside's "Quayside lab array" v1, a draft by Sam.
 */
export const HARBOR_ROAD = 'Harbor Road storage';
export const QUAYSIDE_LAB = 'Quayside lab array';

/** Fresh copies of the demo's documents, safe to mutate. */
export const harborV1 = (): Topology => structuredClone(harborRoadV1) as Topology;
export const harborV2 = (): Topology => structuredClone(harborRoadV2) as Topology;

export async function designId(t: TestApp, name = HARBOR_ROAD): Promise<number> {
  const row = await t.models.Design.findOne({ where: { name } });
  if (!row) throw new Error(`no design ${name}`);
  return row.id;
}

/** Quayside has only Sam (a designer) in the demo; an admin there can try every route on Tidewater's design. */
export const QUAYSIDE_ADMIN = 'quinn@quayside.example';
export async function signInQuaysideAdmin(t: TestApp): Promise<Agent> {
  await addPerson(t, { team: 'Quayside Analytics', name: 'Quinn Abara', email: QUAYSIDE_ADMIN, role: 'admin' });
  return signInWith(t.app, QUAYSIDE_ADMIN);
}

/** The newest version number the agent can see of a design (null when it has none). */
export async function latestOf(agent: Agent, id: number): Promise<number | null> {
  const res = await agent.get(`/api/designs/${id}`).expect(200);
  return res.body.versions[0]?.number ?? null;
}

/** Save `document` on top of the latest version; answers the response (callers assert its status). */
export async function saveOnTop(agent: Agent, id: number, document: unknown, message = 'Next step of the layout') {
  return agent.post(`/api/designs/${id}/versions`).send({ baseVersion: await latestOf(agent, id), message, document });
}

/** Save a new version and submit it for review; answers its number. */
export async function saveAndSubmit(agent: Agent, id: number, document: unknown = harborV2()): Promise<number> {
  const saved = await saveOnTop(agent, id, document);
  if (saved.status !== 201) throw new Error(`save answered ${saved.status}: ${JSON.stringify(saved.body)}`);
  const n = saved.body.version.number as number;
  await agent.post(`/api/designs/${id}/versions/${n}/review`).send({ action: 'submit' }).expect(200);
  return n;
}

/** Everything the fake sink caught for the admin's team (GET /api/dev/mail), newest first. */
export async function mailbox(admin: Agent): Promise<MailMessage[]> {
  return (await admin.get('/api/dev/mail').expect(200)).body.messages as MailMessage[];
}

export type Issue = { path: string; message: string };
