import { z } from 'zod';
import {
  adapterSchema,
  cableSchema,
  CHAP_MODES,
  networkSchema,
  portSchema,
  positionSchema,
  SWITCH_ROLES,
  TOPOLOGY_FORMAT_1,
} from '@/shared/topology/schema';

/**
 * Topology document, format 1, as it was written: kept so that files saved before format 2 still
 * open and stored versions are read as they were stored. Nothing past validate.ts sees this shape —
 * upgrade.ts turns it into format 2 on read. Ports, cards, cables and networks are unchanged in
 * format 2; devices carried a free-text `rack` and a unit `ru` where format 2 has `placement`.
 */
const id = z.string().min(1, 'must not be empty').max(200, 'must be at most 200 characters');
const name = z.string().max(200, 'must be at most 200 characters');
const rack = z.string().max(100, 'must be at most 100 characters').optional();
const ru = z.number().int().min(1).max(100).optional();

const controllerV1Schema = z.object({ id, name, ports: z.array(portSchema) }).strict();

const arrayV1Schema = z
  .object({ id, kind: z.literal('array'), name, controllers: z.array(controllerV1Schema).min(1).max(4), rack, ru })
  .strict();

const switchV1Schema = z
  .object({ id, kind: z.literal('switch'), name, role: z.enum(SWITCH_ROLES), ports: z.array(portSchema), rack, ru })
  .strict();

const hostV1Schema = z
  .object({ id, kind: z.literal('host'), name, iqn: z.string().max(1000).optional(), adapters: z.array(adapterSchema), rack, ru })
  .strict();

export const deviceV1Schema = z.discriminatedUnion('kind', [arrayV1Schema, switchV1Schema, hostV1Schema]);

export const topologyV1Schema = z
  .object({
    format: z.literal(TOPOLOGY_FORMAT_1),
    name,
    devices: z.array(deviceV1Schema),
    cables: z.array(cableSchema),
    networks: z.array(networkSchema),
    security: z.object({ chap: z.enum(CHAP_MODES) }).strict().optional(),
    layout: z.record(z.string(), positionSchema).optional(),
  })
  .strict();

export type TopologyV1 = z.infer<typeof topologyV1Schema>;
export type DeviceV1 = z.infer<typeof deviceV1Schema>;
