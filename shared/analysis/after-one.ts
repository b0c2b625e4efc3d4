import { byId, type AnalysisContext } from '@/shared/analysis/context';
import { powerCuts, powerCutsAfter, withPowerFailures } from '@/shared/analysis/power';
import { powerSpofs, ResilienceEngine, type Resilience } from '@/shared/analysis/resilience';
import type { AfterOneResult, ExposedPair, HostArrayPair } from '@/shared/analysis/types';

/**
 * After one failure (docs/api.md, `--after-one`): for every failure unit not owned by a single host —
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

export function afterOneFailure(ctx: AnalysisContext, base: Resilience, engine?: ResilienceEngine): AfterOneResult[];
export function afterOneFailure(ctx: AnalysisContext, base: Resilience, engine: ResilienceEngine, deadline: number): AfterOneResult[] | null;
/** `deadline` (a Date.now() time): give up and answer null once it has passed. */
export function afterOneFailure(ctx: AnalysisContext, base: Resilience, engine: ResilienceEngine = new ResilienceEngine(ctx), deadline?: number): AfterOneResult[] | null {
  const { groups, arrays, hostIndex, arrayIndex } = engine;
  const H = groups.hosts.length;
  const A = arrays.length;
  // The report's pairs by pair index a·H + h, listed host by host, then array by array, as in hosts[].
  const pairs = Int32Array.from(base.hosts, (pair) => arrayIndex.get(pair.array)! * H + hostIndex.get(pair.host)!);
  const cutsOff = new Map<string, HostArrayPair[]>();
  for (const failure of base.failures) cutsOff.set(failure.unit, failure.cutsOff);
  const cutsBefore = powerCuts(ctx.power, ctx.failed);
  const out: AfterOneResult[] = [];
  const alive = new Uint8Array(A * H);
  for (const unit of afterOneUnits(ctx)) {
    if (deadline !== undefined && Date.now() > deadline) return null;
    const down = withPowerFailures(ctx.power, [...ctx.requested, unit]);
    for (const id of ctx.failed) down.add(id);
    const spofs = engine.dataSpofs(down);
    const cutOff = cutsOff.get(unit) ?? [];
    alive.fill(0);
    for (const index of pairs) if (spofs[Math.floor(index / H)][index % H]) alive[index] = 1;
    for (const pair of cutOff) alive[arrayIndex.get(pair.array)! * H + hostIndex.get(pair.host)!] = 0;
    const power = powerSpofs(engine, down, spofs, alive, powerCutsAfter(ctx.power, cutsBefore, down, unit));
    const exposed: ExposedPair[] = [];
    for (const index of pairs) {
      if (!alive[index]) continue;
      const data = spofs[Math.floor(index / H)][index % H]!;
      const extra = power.get(index);
      if (data.length === 0 && !extra) continue;
      const singlePointsOfFailure = (extra ? [...data, ...extra] : data.slice()).sort(byId);
      exposed.push({ host: groups.hosts[index % H], array: arrays[Math.floor(index / H)].id, singlePointsOfFailure });
    }
    out.push({ failed: unit, exposed, cutOff });
  }
  return out;
}
