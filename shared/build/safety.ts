import { tupleKey } from '@/shared/keys/tuple';
import type { Step } from './types';

/**
 * The safety briefing that opens every bring-up checklist. General wording only: local codes, the
 * equipment makers' instructions and licensed practice always come first, and the first step says so.
 */
const DEFER = 'Where local codes, the makers\u2019 instructions or the site\u2019s rules say otherwise, they win.';

type Caution = { key: string; title: string; detail: string; source: string };

const CAUTIONS: readonly Caution[] = [
  {
    key: 'briefing',
    title: 'Safety briefing',
    detail:
      'Read these cautions with everyone on the job before work starts. They are general: follow local electrical and building codes, ' +
      'the equipment makers\u2019 installation instructions and licensed practice. ' +
      DEFER,
    source: 'common practice',
  },
  {
    key: 'lifting',
    title: 'Heavy equipment: lift with two people',
    detail:
      'Arrays, shelves and servers are heavy. Lift them with two people (or a lift), never alone; keep your back straight and clear the path first.',
    source: 'common practice',
  },
  {
    key: 'rack-stability',
    title: 'Keep the rack stable',
    detail:
      'Deploy the rack\u2019s stabilisers or anchor it before anything is mounted. Load the heaviest items low, and extend only one item at a time on its rails.',
    source: 'common practice',
  },
  {
    key: 'power',
    title: 'Power circuits within their ratings',
    detail:
      'Use the circuits, power strips and cords the equipment is rated for, and keep each circuit within its rating. ' +
      'New circuits and changes to the electrical installation are work for a qualified electrician; the local electrical code applies.',
    source: 'local electrical code',
  },
  {
    key: 'laser',
    title: 'Laser light from optical modules',
    detail:
      'Optical modules and fibres carry invisible laser light (IEC 60825-1 Class 1). Never look into a fibre end or an open optical port, ' +
      'nor through a magnifier or other optical instrument; keep dust caps on unused ports and fibres.',
    source: 'IEC 60825-1',
  },
  {
    key: 'live-data',
    title: 'Live data',
    detail:
      'Work on storage that already holds production data can lose it. Agree a maintenance window, make sure a current backup exists and follow the site\u2019s change process.',
    source: 'common practice',
  },
];

export function safetySteps(): Step[] {
  return CAUTIONS.map((c) => ({
    id: tupleKey(['safety', c.key]),
    phase: 'safety',
    kind: 'safety',
    title: c.title,
    detail: c.detail,
    deviceId: null,
    rackId: null,
    expectedSessions: null,
    caution: true,
    source: c.source,
  }));
}
