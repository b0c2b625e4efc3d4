import { byId, createContext } from '@/shared/analysis/context';
import { afterOneFailure } from '@/shared/analysis/after-one';
import { analyzeResilience, ResilienceEngine } from '@/shared/analysis/resilience';
import { RULE_GROUPS } from '@/shared/analysis/rules';
import { redundancyFindings } from '@/shared/analysis/rules/redundancy';
import type { AfterOneResult, AnalyzeOptions, Finding, Report, Severity } from '@/shared/analysis/types';
import type { Topology } from '@/shared/topology/schema';

/**
 * The analysis of one valid document (run validateTopology first). Pure and deterministic: the
 * report is built from the document alone, every list is sorted by ids in plain code-unit order
 * (findings by their subject lists compared id by id, never joined into one string, which ids
 * holding the separator would make ambiguous), so the same document always gives byte-identical
 * JSON, in the browser and on the server.
 */
const SEVERITY_ORDER: Record<Severity, number> = { error: 0, warning: 1, info: 2 };

/** Lists of ids in order, element by element (a shorter list first when one begins the other). */
function byIdList(x: readonly string[], y: readonly string[]): number {
  for (let i = 0; i < x.length && i < y.length; i += 1) {
    const order = byId(x[i], y[i]);
    if (order !== 0) return order;
  }
  return x.length - y.length;
}

function compareFindings(x: Finding, y: Finding): number {
  return (
    SEVERITY_ORDER[x.severity] - SEVERITY_ORDER[y.severity] ||
    byId(x.rule, y.rule) ||
    byIdList(x.subjects, y.subjects) ||
    byId(x.message, y.message)
  );
}

function run(doc: Topology, failed: readonly string[] | undefined) {
  const ctx = createContext(doc, failed);
  const engine = new ResilienceEngine(ctx);
  const resilience = analyzeResilience(ctx, engine);
  const { hosts, failures } = resilience;
  const findings = redundancyFindings(ctx, hosts).slice();
  // Appended one by one: spreading a long list into push() overflows the call stack.
  for (const group of RULE_GROUPS) for (const finding of group(ctx)) findings.push(finding);
  findings.sort(compareFindings);
  return { ctx, engine, resilience, report: { hosts, failures, findings } as Report };
}

export function analyze(doc: Topology, options: AnalyzeOptions = {}): Report {
  const { ctx, engine, resilience, report } = run(doc, options.failed);
  if (!options.afterOne) return report;
  return { ...report, afterOneFailure: afterOneFailure(ctx, resilience, engine) };
}

/**
 * The report (without afterOneFailure) and, apart, afterOneFailure — or null when it was not done by
 * `deadline` (a Date.now() time). The server stores the two side by side.
 */
export function analyzeWithAfterOne(doc: Topology, deadline: number): { report: Report; afterOneFailure: AfterOneResult[] | null } {
  const { ctx, engine, resilience, report } = run(doc, undefined);
  return { report, afterOneFailure: afterOneFailure(ctx, resilience, engine, deadline) };
}
