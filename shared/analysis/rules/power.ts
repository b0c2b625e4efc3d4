import type { AnalysisContext } from '@/shared/analysis/context';
import type { Finding } from '@/shared/analysis/types';
import { displayName } from '@/shared/topology/index';

/**
 * Power drafting mistakes (docs/topology-format.md, format 2): a PSU on no feed, and a device whose
 * supplies all hang on one feed. Findings, never refusals. A PSU on no feed is taken by the analysis
 * as never losing its supply, so what the report says about it may be too kind: a warning. A device
 * with every supply on one feed goes down with that feed — a second supply only helps on a second
 * feed (common practice) — so the feed is a single point of failure of whatever depends on the device.
 */
export function powerFindings(ctx: AnalysisContext): Finding[] {
  const out: Finding[] = [];
  for (const device of ctx.power.powered) {
    const psus = device.psus ?? [];
    for (const psu of psus) {
      if (psu.feedId !== undefined) continue;
      out.push({
        rule: 'psu-no-feed',
        severity: 'warning',
        subjects: [psu.id, device.id],
        message: `Power supply ${displayName(psu)} of ${displayName(device)} is on no power feed; the analysis cannot tell what it shares a feed with. Give it a feed.`,
      });
    }
    const feedId = psus[0].feedId;
    if (feedId === undefined || !psus.every((psu) => psu.feedId === feedId)) continue;
    const feed = ctx.power.feeds.get(feedId);
    const feedName = feed ? displayName(feed) : feedId;
    out.push({
      rule: 'psus-one-feed',
      severity: 'warning',
      subjects: [device.id, feedId, ...psus.map((psu) => psu.id)],
      message:
        psus.length === 1
          ? `${displayName(device)} has one power supply, on ${feedName}: losing that feed or that supply takes ${displayName(device)} down.`
          : `All ${psus.length} power supplies of ${displayName(device)} are on ${feedName}: losing that one feed takes ${displayName(device)} down. Put them on different feeds.`,
    });
  }
  return out;
}
