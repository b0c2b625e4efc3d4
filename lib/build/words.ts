import { CABLE_STATES, type CableState } from '@/shared/api/build';

/** The words the site screens use for a cable's state; the badge tone only helps scanning. */
export const STATE_LABELS: Record<CableState, string> = {
  'not-started': 'Not started',
  run: 'Run',
  tested: 'Tested',
  problem: 'Problem',
};

export const STATE_TONES: Record<CableState, 'neutral' | 'info' | 'success' | 'danger'> = {
  'not-started': 'neutral',
  run: 'info',
  tested: 'success',
  problem: 'danger',
};

/** "12 tested, 3 run, 1 problem" — the states that have cables, in the order of the work; "" for none. */
export function stateSummary(states: Record<CableState, number>): string {
  return CABLE_STATES.filter((s) => s !== 'not-started' && states[s] > 0)
    .map((s) => `${states[s]} ${STATE_LABELS[s].toLowerCase()}`)
    .join(', ');
}

export function plural(count: number, one: string, many = `${one}s`): string {
  return `${count} ${count === 1 ? one : many}`;
}
