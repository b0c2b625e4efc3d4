import type { ScheduleEnd } from '@/shared/schedule/types';

/**
 * Cable identifiers in the ANSI/TIA-606 administration style: near end, `/`, far end, each end
 * `cabinet-RU:port` (`A01-40:12/A01-07:card-1.1`). The unit is written with at least two digits,
 * as the standard's examples do. A port named `p12` or `12` is port 12; a port on a controller or
 * card carries the part too (`ctl-a.1`), since two cards of one host both have a port 1. An end
 * whose device is not placed in a rack falls back to `device.part.port` as named in the design.
 */
export function endIdentifier(end: ScheduleEnd): string {
  if (end.rack === null || end.ru === null) return [end.device, end.part, end.port].filter((x) => x !== null).join('.');
  const port = portNumber(end.port);
  return `${end.rack}-${String(end.ru).padStart(2, '0')}:${end.part === null ? port : `${end.part}.${port}`}`;
}

export function cableIdentifier(near: ScheduleEnd, far: ScheduleEnd): string {
  return `${endIdentifier(near)}/${endIdentifier(far)}`;
}

/** "p12" → "12", "Port 3" → "3", "mgmt" → "mgmt". */
export function portNumber(name: string): string {
  const match = /^(?:p|port)?\s*(\d+)$/i.exec(name.trim());
  return match ? String(Number(match[1])) : name;
}
