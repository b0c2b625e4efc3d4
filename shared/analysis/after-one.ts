import { byId, type AnalysisContext } from '@/shared/analysis/context';
import { withPowerFailures } from '@/shared/analysis/power';
import { powerSpofs, sortedOrder, ResilienceEngine, type Resilience } from '@/shared/analysis/resilience';
import type { AfterOneResult, ExposedPair, HostArrayPair } from '@/shared/analysis/types';

/**
 * After one failure (api.md, `--after-one`): for every failure unit not owned by a single host —
 * switches, controllers, cables that touch no host port (inter-switch and array-side), the PSUs of
 * switches and arrays, and every power feed — the host/array pairs it cuts off while it is down,
 * and the pairs it leaves with a single point of failure, with those points. This is the question a
 * maintenance window asks: "while fab-a is down, which hosts are one failure away from losing storage?"
 *
 * A pair is cut off by u exactly when u is among its single points of failure in the report, so
 * cutOff is read from the report. The exposure is the single-failure analysis again with u down:
 * the core graph, the attachments and the sessions are built once (ResilienceEngine) and each unit
 * costs only the dominator runs with its nodes left out, plus the power units that are left alone.
 * A pair already exposed before u fails is listed too: it is exposed while u is down.
 */
export function afterOneUnits(ctx: AnalysisContext): string[] {
  const units: string[] = [];
  const hostPort = (portId: string) => ctx.index.ports.get(portId)?.device.kind === 'host';
  for (const device of ctx.doc.devices) {
    if (device.kind === 'switch') units.push(device.id);
    if (device.kind === 'array') for (const controller of device.controllers) units.push(controller.id);
    if (device.kind !== 'host') for (const psu of device.psus ?? []) units.push(psu.id);
  }
  for (const cable of ctx.doc.cables) if (!hostPort(cable.a) && !hostPort(cable.b)) units.push(cable.id);
  for (const feed of ctx.doc.powerFeeds ?? []) units.push(feed.id);
  return units.filter((id) => !ctx.failed.has(id)).sort(byId);
}

export function afterOneFailure(ctx: AnalysisContext, base: Resilience, engine: ResilienceEngine = new ResilienceEngine(ctx)): AfterOneResult[] {
  const { groups, arrays } = engine;
  const H = groups.hosts.length;
  const hostIndex = new Map<string, number>();
  groups.hosts.forEach((host, h) => hostIndex.set(host, h));
  const arrayIndex = new Map<string, number>();
  arrays.forEach((array, a) => arrayIndex.set(array.id, a));
  // The report's pairs, by pair index a·H + h, in the report's order (host, then array).
  const pairs = base.hosts.map((pair) => ({ pair, index: arrayIndex.get(pair.array)! * H + hostIndex.get(pair.host)! }));
  const cutsOff = new Map<string, HostArrayPair[]>();
  for (const failure of base.failures) cutsOff.set(failure.unit, failure.cutsOff);
  const order = sortedOrder(groups.hosts);
  const out: AfterOneResult[] = [];
  for (const unit of afterOneUnits(ctx)) {
    const down = withPowerFailures(ctx.power, [...ctx.requested, unit]);
    for (const id of ctx.failed) down.add(id);
    const spofs = engine.dataSpofs(down);
    const cutOff = cutsOff.get(unit) ?? [];
    const gone = new Set<number>();
    for (const pair of cutOff) gone.add(arrayIndex.get(pair.array)! * H + hostIndex.get(pair.host)!);
    const alive = new Uint8Array(arrays.length * H);
    for (const { index } of pairs) if (!gone.has(index) && spofs[Math.floor(index / H)][index % H]) alive[index] = 1;
    const power = powerSpofs(engine, down, spofs, (a, h) => alive[a * H + h] === 1);
    const exposed: ExposedPair[] = [];
    for (const h of order) {
      for (let a = 0; a < arrays.length; a += 1) {
        const index = a * H + h;
        if (!alive[index]) continue;
        const data = spofs[a][h]!;
        const extra = power.get(index);
        if (data.length === 0 && !extra) continue;
        const singlePointsOfFailure = (extra ? [...data, ...extra] : data.slice()).sort(byId);
        exposed.push({ host: groups.hosts[h], array: arrays[a].id, singlePointsOfFailure });
      }
    }
    out.push({ failed: unit, exposed, cutOff });
  }
  return out;
}
