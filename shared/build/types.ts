import type { HostArrayResult } from '@/shared/analysis/types';
import type { TopologyIndex } from '@/shared/topology/index';
import type { Rack, Topology } from '@/shared/topology/schema';

/** The bring-up checklist's types (shared/build/steps.ts builds it). */
export const STEP_PHASES = ['safety', 'racks', 'switches', 'shelves', 'arrays', 'hosts', 'management'] as const;
export type StepPhase = (typeof STEP_PHASES)[number];

export type StepKind =
  | 'safety'
  | 'rack'
  | 'power'
  | 'switch'
  | 'shelves'
  | 'array'
  | 'array-ports'
  | 'initiator'
  | 'host-port'
  | 'chap'
  | 'discovery'
  | 'login'
  | 'multipath'
  | 'management';

export type Step = {
  /** Stable: `tupleKey([kind, ...ids])`. */
  id: string;
  phase: StepPhase;
  kind: StepKind;
  /** A short imperative line ("Power on fab-a"). */
  title: string;
  /** The whole instruction with the design's values (addresses, VLANs, MTUs, portals, counts). */
  detail: string;
  /** The device the step is about, or null. */
  deviceId: string | null;
  /** The rack the step is about (the device's rack for a device step), or null. */
  rackId: string | null;
  /** Login and multipath steps: the sessions the analysis plans for the host; otherwise null. */
  expectedSessions: number | null;
  /** A safety caution rather than a task. */
  caution: boolean;
  /** Where the check comes from: a standard ("RFC 7143 §15"), "common practice" or "the design". */
  source: string;
};

/** What the step builders share: the document, its lookups and the analysis's sessions per host. */
export type StepContext = {
  doc: Topology;
  index: TopologyIndex;
  racks: ReadonlyMap<string, Rack>;
  /** Host id → the report's host/array results for that host, in report order. */
  planned: ReadonlyMap<string, HostArrayResult[]>;
};

