/** The analysis report (docs/analysis.md): the same shape in the browser and on the server. */
export type Severity = 'error' | 'warning' | 'info';

export type UnitKind = 'cable' | 'adapter' | 'switch' | 'controller' | 'psu' | 'feed';

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

/** A pair left up while one unit is down, and what alone would then cut it off. */
export type ExposedPair = { host: string; array: string; singlePointsOfFailure: string[] };

/** One unit down (docs/api.md `--after-one`): the pairs it cuts off, and those it leaves exposed. */
export type AfterOneResult = { failed: string; exposed: ExposedPair[]; cutOff: HostArrayPair[] };

export type Report = {
  hosts: HostArrayResult[];
  failures: FailureResult[];
  findings: Finding[];
  /** Only when asked for (AnalyzeOptions.afterOne): sorted by the failed unit's id. */
  afterOneFailure?: AfterOneResult[];
};

export type AnalyzeOptions = {
  /** Units (cable, card, switch, controller ids) to treat as failed before anything is computed. */
  failed?: readonly string[];
  /** Add `afterOneFailure` (docs/api.md `--after-one`). */
  afterOne?: boolean;
};
