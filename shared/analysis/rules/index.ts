import type { AnalysisContext } from '@/shared/analysis/context';
import type { Finding } from '@/shared/analysis/types';

/** The design-rule groups that read the document itself (redundancy findings read hosts[] instead). */
export type RuleGroup = (ctx: AnalysisContext) => Finding[];

export const RULE_GROUPS: RuleGroup[] = [];
