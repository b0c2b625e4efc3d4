/** The analysis report (docs/analysis.md): the same shape in the browser and on the server. */
export type Severity = 'error' | 'warning' | 'info';

export type UnitKind = 'cable' | 'adapter' | 'switch' | 'controller';

export type HostArrayResult = {
  host: string;
  array: string;
  /** Host data port × controller data port pairs that can form a session. */
  sessions: number;
  controllersReached: string[];
  singlePointsOfFailure: string[];
  redundant: boolean;
};

export type HostArrayPair = { host: string; array: string };

export type FailureResult = { unit: string; kind: UnitKind; cutsOff: HostArrayPair[] };

export type Finding = { rule: string; severity: Severity; subjects: string[]; message: string };

export type Report = { hosts: HostArrayResult[]; failures: FailureResult[]; findings: Finding[] };

export type AnalyzeOptions = {
  /** Units (cable, card, switch, controller ids) to treat as failed before anything is computed. */
  failed?: readonly string[];
};
