import { Op } from 'sequelize';
import type { User } from '@/shared/api/auth';
import type { GenerateResponse, GenerateSecretsBody, RevealResponse, SecretDirection, SecretsStatus } from '@/shared/api/secrets';
import { tupleKey } from '@/shared/keys/tuple';
import { can } from '@/shared/roles';
import { displayName } from '@/shared/topology/index';
import type { Topology } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';
import type { ServiceDeps } from '@/server/services/deps';
import { loadDesignView, loadDocument, type DesignView } from '@/server/services/designs/load';
import { NO_SUCH_DESIGN } from '@/server/services/designs/messages';
import { fail, ok, type Result } from '@/server/services/result';
import { DEFAULT_SECRET_LENGTH, generateSecret, open, resolveSecretsKey, seal } from './crypto';

/**
 * CHAP secrets of a design (api.md). Made from node:crypto randomness, one per initiator (host) and,
 * for mutual CHAP, a different one per host for the target side: RFC 7143 §9.2.1 forbids using one
 * secret for both directions and advises against sharing one between initiators. Stored only
 * sealed (crypto.ts). Shown only to admins and installers, and each showing is recorded; a
 * designer or reviewer gets 403, another team 404 (checked first, so nothing is revealed to them).
 *
 * The secrets never leave through anything else: no document, export, e-mail, log line or error
 * body reads this table, and nothing here logs.
 */
export const REGENERATED_NOTICE =
  'New CHAP secrets replace the old ones here. The old secrets keep working on the hosts and the array until they are changed there; ' +
  'change each host and its target entries together, in a maintenance window, or that host loses its sessions.';
export const FIRST_NOTICE = 'CHAP secrets made. Installers and admins can show them on the report screen; each showing is recorded.';
export const REVEAL_NOTICE = 'Keep these secrets out of e-mail, chat and tickets. Type them into the host and the array, then close this view.';

const NOT_ALLOWED_TO_GENERATE = 'Only admins and designers make CHAP secrets.';
const NOT_ALLOWED_TO_REVEAL = 'Only admins and installers are shown CHAP secrets.';
const CANNOT_OPEN = 'The stored CHAP secrets cannot be opened with this server’s SECRETS_KEY (was the key changed?). Make new ones.';

/** The hosts that log in to storage: those with a data port. */
function iscsiHosts(doc: Topology): { id: string; name: string }[] {
  const out: { id: string; name: string }[] = [];
  for (const device of doc.devices) {
    if (device.kind !== 'host') continue;
    if (device.adapters.some((a) => a.ports.some((p) => p.role === 'data'))) out.push({ id: device.id, name: displayName(device) });
  }
  return out;
}

const context = (designId: number, hostId: string, direction: SecretDirection) => tupleKey(['chap', String(designId), hostId, direction]);

export function createSecretsService({ models, sequelize, config, clock }: ServiceDeps) {
  const key = resolveSecretsKey(config);

  async function latestDocument(view: DesignView): Promise<{ doc: Topology; number: number } | null> {
    const latest = view.versions[0];
    if (!latest) return null;
    const checked = validateTopology(await loadDocument(models, latest.row.id));
    if (!checked.ok) throw new Error(`stored version ${latest.row.id} no longer validates`);
    return { doc: checked.doc, number: latest.row.number };
  }

  async function hostNames(view: DesignView): Promise<Map<string, string>> {
    const latest = await latestDocument(view);
    return new Map((latest ? iscsiHosts(latest.doc) : []).map((h) => [h.id, h.name]));
  }

  return {
    async generate(viewer: User, id: number, body: GenerateSecretsBody): Promise<Result<GenerateResponse>> {
      const view = await loadDesignView(models, viewer, id);
      if (!view) return fail('not-found', NO_SUCH_DESIGN);
      if (!can(viewer.role, 'generateSecrets')) return fail('forbidden', NOT_ALLOWED_TO_GENERATE);
      const latest = await latestDocument(view);
      if (!latest) return fail('conflict', 'Save a version of the design first: the secrets are made for its hosts.');
      const mode = latest.doc.security?.chap ?? 'none';
      if (mode === 'none') return fail('conflict', `CHAP is off in version ${latest.number}; turn on one-way or mutual CHAP and save, then make the secrets.`);
      const hosts = iscsiHosts(latest.doc);
      if (hosts.length === 0) return fail('conflict', `Version ${latest.number} has no host with a storage port to make secrets for.`);
      const length = body.length ?? DEFAULT_SECRET_LENGTH;
      const directions: SecretDirection[] = mode === 'mutual' ? ['initiator', 'target'] : ['initiator'];
      const made = new Set<string>();
      const at = new Date(clock());
      const rows = hosts.flatMap((host) =>
        directions.map((direction) => {
          let secret = generateSecret(length);
          // Every secret of the design differs from every other (RFC 7143 §9.2.1).
          while (made.has(secret)) secret = generateSecret(length);
          made.add(secret);
          return { designId: id, hostId: host.id, direction, sealed: seal(key, secret, context(id, host.id, direction)), length, createdById: viewer.id, createdAt: at };
        }),
      );
      const replaced = await sequelize.transaction(async (transaction) => {
        const removed = await models.ChapSecret.destroy({ where: { designId: id }, transaction });
        await models.ChapSecret.bulkCreate(rows, { transaction });
        return removed > 0;
      });
      return ok({
        generated: { hosts: hosts.length, secrets: rows.length, length, mode, at: at.toISOString(), version: latest.number },
        notice: replaced ? REGENERATED_NOTICE : FIRST_NOTICE,
      });
    },

    async reveal(viewer: User, id: number, host?: string): Promise<Result<RevealResponse>> {
      const view = await loadDesignView(models, viewer, id);
      if (!view) return fail('not-found', NO_SUCH_DESIGN);
      if (!can(viewer.role, 'revealSecrets')) return fail('forbidden', NOT_ALLOWED_TO_REVEAL);
      const rows = await models.ChapSecret.findAll({ where: host === undefined ? { designId: id } : { designId: id, hostId: host }, order: [['id', 'ASC']] });
      if (host !== undefined && rows.length === 0) return fail('not-found', 'This design has no CHAP secrets for that host.');
      const names = await hostNames(view);
      let secrets: RevealResponse['secrets'];
      try {
        secrets = rows.map((row) => ({
          host: row.hostId,
          name: names.get(row.hostId) ?? row.hostId,
          direction: row.direction,
          secret: open(key, row.sealed, context(id, row.hostId, row.direction)),
        }));
      } catch {
        return fail('conflict', CANNOT_OPEN);
      }
      if (secrets.length > 0) {
        await models.SecretReveal.create({ designId: id, userId: viewer.id, hostId: host ?? null, count: secrets.length, createdAt: new Date(clock()) });
      }
      return ok({ secrets, generatedAt: rows[0]?.createdAt.toISOString() ?? null, notice: REVEAL_NOTICE });
    },

    /** Whether secrets exist, for which hosts, and who was shown them when: never a secret. */
    async status(viewer: User, id: number): Promise<Result<SecretsStatus>> {
      const view = await loadDesignView(models, viewer, id);
      if (!view) return fail('not-found', NO_SUCH_DESIGN);
      const latest = await latestDocument(view);
      const names = new Map((latest ? iscsiHosts(latest.doc) : []).map((h) => [h.id, h.name]));
      const rows = await models.ChapSecret.findAll({ attributes: ['hostId', 'direction', 'length', 'createdById', 'createdAt'], where: { designId: id }, order: [['id', 'ASC']] });
      const reveals = await models.SecretReveal.findAll({ where: { designId: id }, order: [['id', 'DESC']], limit: 50 });
      const userIds = [...new Set([...rows.map((r) => r.createdById), ...reveals.map((r) => r.userId)])];
      const users = userIds.length ? await models.User.findAll({ attributes: ['id', 'name'], where: { id: { [Op.in]: userIds } } }) : [];
      const person = (userId: number) => ({ id: userId, name: users.find((u) => u.id === userId)?.name ?? 'a former member' });
      const hosts = new Map<string, SecretsStatus['hosts'][number]>();
      for (const row of rows) {
        let entry = hosts.get(row.hostId);
        if (!entry) hosts.set(row.hostId, (entry = { host: row.hostId, name: names.get(row.hostId) ?? row.hostId, directions: [] }));
        entry.directions.push(row.direction);
      }
      return ok({
        mode: latest?.doc.security?.chap ?? 'none',
        generatedAt: rows[0]?.createdAt.toISOString() ?? null,
        generatedBy: rows[0] ? person(rows[0].createdById) : null,
        length: rows[0]?.length ?? null,
        hosts: [...hosts.values()],
        reveals: reveals.map((r) => ({ by: person(r.userId), at: r.createdAt.toISOString(), host: r.hostId, count: r.count })),
      });
    },
  };
}

export type SecretsService = ReturnType<typeof createSecretsService>;
