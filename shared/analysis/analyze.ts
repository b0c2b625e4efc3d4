import { byId, createContext } from '@/shared/analysis/context';
import { analyzeResilience } from '@/shared/analysis/resilience';
import { RULE_GROUPS } from '@/shared/analysis/rules';
import { redundancyFindings } from '@/shared/analysis/rules/redundancy';
import type { AnalyzeOptions, Finding, Report, Severity } from '@/shared/analysis/types';
import type { Topology } from '@/shared/topology/schema';

/**
 * The analysis of one valid document (run validateTopology first). Pure and deterministic: the
 * report is built from the document alone, every list is sorted by ids in plain code-unit order,
 * so the same document always gives byte-identical JSON, in the browser and on the server.
 */
const SEVERITY_ORDER: Record<Severity, number> = { error: 0, warning: 1, info: 2 };

function compareFindings(x: Finding, y: Finding): number {
  return (
    SEVERITY_ORDER[x.severity] - SEVERITY_ORDER[y.severity] ||
    byId(x.rule, y.rule) ||
    byId(x.subjects.join('\u0000'), y.subjects.join('\u0000')) ||
    byId(x.message, y.message)
  );
}

export function analyze(doc: Topology, options: AnalyzeOptions = {}): Report {
  const ctx = createContext(doc, options.failed);
  const { hosts, failures } = analyzeResilience(ctx);
  const findings = redundancyFindings(ctx, hosts).slice();
  // Appended one by one: spreading a long list into push() overflows the call stack.
  for (const group of RULE_GROUPS) for (const finding of group(ctx)) findings.push(finding);
  findings.sort(compareFindings);
  return { hosts, failures, findings };
}
