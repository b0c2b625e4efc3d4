import type { Report } from '@/shared/analysis/types';
import type { DesignDeps } from '@/server/services/designs/deps';
import { loadDocumentText } from '@/server/services/designs/load';
import type { LoadHosts } from './version-cache';

/**
 * The hosts of a version's report for its checklist: the report stored with the version when it
 * was saved, or, for a version saved before reports were stored, one computed in the analysis
 * pool (never on the request thread). Nothing is written back: versions are immutable.
 */
export function storedHosts(deps: Pick<DesignDeps, 'models' | 'analysis'>): LoadHosts {
  return async (versionId) => {
    const row = await deps.models.DesignVersion.findByPk(versionId, { attributes: ['id', 'report'] });
    if (row?.report) return (JSON.parse(row.report) as Report).hosts;
    const computed = await deps.analysis.report(await loadDocumentText(deps.models, versionId));
    if (!computed.ok) throw new Error(`the report of stored version ${versionId} could not be made: ${computed.message}`);
    return (JSON.parse(computed.value.reportJson) as Report).hosts;
  };
}
