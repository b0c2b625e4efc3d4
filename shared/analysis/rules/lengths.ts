import { atSentenceStart, describeUnit, type AnalysisContext } from '@/shared/analysis/context';
import type { Finding } from '@/shared/analysis/types';
import { linkSpeed, MEDIA_NAMES, reachOf } from '@/shared/rules/cables';
import { lengthEstimator } from '@/shared/schedule/length';

/**
 * Cable lengths against the rack positions (shared/schedule/length.ts explains the estimate): a
 * chosen length shorter than the estimate will likely not reach (warning: the estimate is a model of
 * the route, not a survey of it), and an estimate beyond the reach of the media at the link speed
 * (the limits table, IEEE 802.3) means the link may not come up at all over that route. When the
 * chosen length itself is past the reach, cable-too-long already says so and this rule stays quiet.
 */
export function lengthFindings(ctx: AnalysisContext): Finding[] {
  if (!ctx.doc.racks?.length) return [];
  const estimate = lengthEstimator(ctx.doc);
  const out: Finding[] = [];
  for (const cable of ctx.doc.cables) {
    const a = ctx.index.ports.get(cable.a);
    const b = ctx.index.ports.get(cable.b);
    if (!a || !b) continue;
    const estimated = estimate(a.device, b.device);
    if (estimated === null) continue;
    const reach = reachOf(cable.media, linkSpeed(a.port.speedGbps, b.port.speedGbps));
    const chosen = cable.lengthM;
    if (chosen !== undefined && chosen < estimated) {
      out.push({
        rule: 'cable-shorter-than-estimate',
        severity: 'warning',
        subjects: [cable.id],
        message: `${atSentenceStart(describeUnit(ctx, cable.id))} is ${chosen} m, shorter than the ${estimated} m its ends' rack positions call for.`,
      });
    }
    if (reach && estimated > reach.maxM && !(chosen !== undefined && chosen > reach.maxM)) {
      out.push({
        rule: 'cable-estimate-beyond-reach',
        severity: 'warning',
        subjects: [cable.id],
        message: `${atSentenceStart(describeUnit(ctx, cable.id))} needs about ${estimated} m between its racks, beyond the ${reach.maxM} m ${MEDIA_NAMES[cable.media]} reaches at ${reach.speedGbps} Gb/s (${reach.source}).`,
      });
    }
  }
  return out;
}
