import { analyze } from '@/shared/analysis/analyze';
import { countSessions, sessionPairs } from '@/shared/analysis/sessions';
import { createContext } from '@/shared/analysis/context';
import { harborRoadV1, harborRoadV2 } from '@/shared/fixtures/harbor-road';
import { loginPlan, portalOf } from '@/shared/handover/login-plan';
import { tupleKey } from '@/shared/keys/tuple';
import { indexTopology } from '@/shared/topology/index';
import type { Topology } from '@/shared/topology/schema';
import { randomDesign } from '../helpers/random-design';

/** Report sessions per (host, array), and the same counted from the plan's targets. */
function reportSessions(doc: Topology): Map<string, number> {
  const out = new Map<string, number>();
  for (const pair of analyze(doc).hosts) out.set(tupleKey([pair.host, pair.array]), pair.sessions);
  return out;
}

function planSessions(doc: Topology): Map<string, number> {
  const out = new Map<string, number>();
  for (const host of loginPlan(doc).hosts) {
    for (const port of host.ports) {
      for (const target of port.targets) {
        const key = tupleKey([host.host, target.array]);
        out.set(key, (out.get(key) ?? 0) + 1);
      }
    }
  }
  return out;
}

describe('login plan of the Harbor Road demo, version 2', () => {
  const doc = harborRoadV2();
  const plan = loginPlan(doc);
  const report = analyze(doc);
  const index = indexTopology(doc);

  it('lists every host of the report, with the report’s session count', () => {
    const reportHosts = new Map<string, number>();
    for (const pair of report.hosts) reportHosts.set(pair.host, (reportHosts.get(pair.host) ?? 0) + pair.sessions);
    expect(plan.hosts.map((h) => h.host).sort()).toEqual([...reportHosts.keys()].sort());
    for (const host of plan.hosts) {
      expect(host.expectedSessions).toBe(reportHosts.get(host.host));
      expect(host.ports.reduce((n, p) => n + p.targets.length, 0)).toBe(host.expectedSessions);
    }
    // Six hosts, one storage port per card on each fabric; 2 controllers × 4 ports, half of them on
    // each fabric: 4 portals per host port, 8 sessions per host (the fixture's shape, worked by hand).
    expect(plan.hosts).toHaveLength(6);
    for (const host of plan.hosts) expect(host.ports.map((p) => p.targets.length)).toEqual([4, 4]);
  });

  it('lists for every host exactly the portals the report’s sessions count', () => {
    expect(planSessions(doc)).toEqual(reportSessions(doc));
    for (const host of plan.hosts) {
      const reached = report.hosts.filter((p) => p.host === host.host).flatMap((p) => p.controllersReached).sort();
      const planned = [...new Set(host.ports.flatMap((p) => p.targets.map((t) => t.controller)))].sort();
      expect(planned).toEqual(reached);
      const portals = host.ports.flatMap((p) => p.targets.map((t) => t.portal));
      // Each session is a distinct (host port, portal) pair.
      const pairs = host.ports.flatMap((p) => p.targets.map((t) => tupleKey([p.port, t.portal ?? ''])));
      expect(new Set(pairs).size).toBe(pairs.length);
      for (const portal of portals) {
        // iSCSI's IANA-registered TCP port is 3260 — RFC 7143 §15 (docs/trade-values.md).
        expect(portal).toMatch(/^\d{1,3}(\.\d{1,3}){3}:3260$/);
      }
    }
  });

  it('gives each portal the controller port’s own address on the host port’s network', () => {
    for (const host of plan.hosts) {
      for (const port of host.ports) {
        const own = index.ports.get(port.port)!.port.address;
        expect(own?.mode).toBe('static');
        expect(port.address).toBe((own as { ip: string }).ip);
        for (const target of port.targets) {
          const ref = index.ports.get(target.port)!;
          expect(ref.controller?.id).toBe(target.controller);
          expect(ref.port.networkId).toBe(port.network);
          expect(target.portal).toBe(`${(ref.port.address as { ip: string }).ip}:3260`); // RFC 7143 §15
          // vault-1 carries the demo's target name (an iqn name, RFC 7143 §4.2.7.4).
          expect(target.iqn).toBe('iqn.2026-01.example.tidewater:storage.vault-1');
        }
      }
      expect(host.initiator).toMatch(/^iqn\.2026-01\.example\.tidewater:/);
    }
  });

  it('is the same plan every time', () => {
    expect(JSON.stringify(loginPlan(harborRoadV2()))).toBe(JSON.stringify(plan));
  });
});

describe('login plan and the report agree', () => {
  it('on version 1, where cam-rec-2 has only one fabric', () => {
    const doc = harborRoadV1();
    expect(planSessions(doc)).toEqual(reportSessions(doc));
    const cam = loginPlan(doc).hosts.find((h) => h.host === 'cam-rec-2')!;
    expect(cam.ports.filter((p) => p.targets.length === 0)).toHaveLength(1);
  });

  it('on 300 seeded random designs (direct attach, loops, ports cabled twice, no networks)', () => {
    for (let seed = 1; seed <= 300; seed += 1) {
      const doc = randomDesign(seed);
      expect({ seed, plan: planSessions(doc) }).toEqual({ seed, plan: reportSessions(doc) });
      // The pairing the plan lists is the one countSessions counts.
      const ctx = createContext(doc);
      const counted = countSessions(ctx);
      let total = 0;
      for (const arrays of counted.values()) for (const pair of arrays.values()) total += pair.sessions;
      expect(sessionPairs(createContext(doc)).reduce((n, p) => n + p.controllerPorts.length, 0)).toBe(total);
    }
  });
});

describe('portalOf', () => {
  it('writes address:3260, with brackets around IPv6', () => {
    expect(portalOf('198.51.100.10')).toBe('198.51.100.10:3260'); // RFC 7143 §15: TCP 3260
    // An IPv6 TargetAddress is bracketed — RFC 7143 §13.8 / RFC 3986 §3.2.2 (section numbers from memory).
    expect(portalOf('2001:DB8::10')).toBe('[2001:db8::10]:3260');
    expect(portalOf('not an address')).toBeNull();
  });
});
