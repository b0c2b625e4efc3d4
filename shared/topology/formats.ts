import { z } from 'zod';
import { topologyV1Schema } from '@/shared/topology/format1';
import { topologySchema } from '@/shared/topology/schema';
import { upgradeTopology } from '@/shared/topology/upgrade';

/**
 * Every format Cablewright reads, told apart by `format`, each coming out as the current one: a
 * format 1 document is upgraded as it is parsed, so its issues still carry its own paths (devices
 * keep their places) and whatever passes the gate is format 2.
 */
export const READABLE_FORMATS = [topologyV1Schema.shape.format.value, topologySchema.shape.format.value] as const;

export const readableTopologySchema = z.discriminatedUnion('format', [topologyV1Schema.transform(upgradeTopology), topologySchema]);
