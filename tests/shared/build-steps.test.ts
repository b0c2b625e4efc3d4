import { analyze } from '@/shared/analysis/analyze';
import { bringUpSteps, plannedSessions, STEP_PHASES, type Step } from '@/shared/build';
import { harborRoadV1, harborRoadV2, HARBOR_ROAD_HOSTS } from '@/shared/fixtures/harbor-road';
import type { Topology } from '@/shared/topology/schema';
import { hostilePool, renameIds } from './helpers/hostile';

/** The bring-up checklist of the demo's approved version 2, checked against the trade and the analysis. */
const doc = harborRoadV2();
const report = analyze(doc);
const steps = bringUpSteps(doc, report);
const byId = new Map(steps.map((s) => [s.id, s]));
const step = (...parts: string[]) => {
  const found = byId.get(JSON.stringify(parts));
  if (!found) throw new Error(`no step ${JSON.stringify(parts)}`);
  return found;
};
const indexOf = (s: Step) => steps.indexOf(s);

describe('the order of the checklist', () => {
  it('runs phase by phase: safety, racks and power, switches, shelves, arrays, hosts, management', () => {
    const phases = steps.map((s) => STEP_PHASES.indexOf(s.phase));
    expect(phases).toEqual([...phases].sort((a, b) => a - b));
    expect([...new Set(steps.map((s) => s.phase))]).toEqual([...STEP_PHASES]);
  });

  it('opens with the safety briefing: lifting, rack stability, power ratings, laser light, live data, local codes first', () => {
    const safety = steps.filter((s) => s.phase === 'safety');
    expect(steps.slice(0, safety.length)).toEqual(safety);
    expect(safety.every((s) => s.caution)).toBe(true);
    const text = safety.map((s) => `${s.title} ${s.detail}`).join('\n');
    expect(text).toMatch(/two people/); // docs/trade-values.md cautions: two-person lift
    expect(text).toMatch(/stabilisers/); // docs/trade-values.md cautions: deploy stabilisers
    expect(text).toMatch(/within its rating/); // docs/trade-values.md cautions: circuits and cords the equipment is rated for
    expect(text).toMatch(/qualified electrician/); // docs/trade-values.md cautions
    expect(text).toMatch(/IEC 60825-1 Class 1/); // IEC 60825-1: laser product classes
    expect(text).toMatch(/never look into a fibre end/i); // docs/trade-values.md cautions
    expect(text).toMatch(/backup/); // docs/trade-values.md cautions: live production storage
    expect(safety[0].detail).toMatch(/local electrical and building codes.*licensed practice/);
  });

  it('powers on the switches first, then expansion shelves, then the array and its ready indication, then the hosts', () => {
    // common practice (docs/trade-values.md): switches → expansion shelves → array → hosts once the array reports ready.
    const switches = ['oob-1', 'fab-a', 'fab-b'].map((s) => step('switch', s));
    const shelves = step('shelves', 'vault-1');
    const array = step('array', 'vault-1');
    const firstHost = steps.find((s) => s.phase === 'hosts')!;
    expect(switches.map(indexOf)).toEqual([...switches.map(indexOf)].sort((a, b) => a - b)); // management switch first, then by name
    for (const s of switches) expect(indexOf(s)).toBeLessThan(indexOf(shelves));
    expect(indexOf(shelves)).toBeLessThan(indexOf(array));
    expect(indexOf(array)).toBeLessThan(indexOf(firstHost));
    expect(array.detail).toMatch(/wait for its ready indication/);
    expect(array.detail).toMatch(/ctl-a and ctl-b/);
    expect(shelves.title).toBe('Expansion shelves of vault-1, if any');
    // Racks are stood and powered before anything is switched on.
    expect(indexOf(step('power', 'rk-a02'))).toBeLessThan(indexOf(switches[0]));
    expect(step('power', 'rk-a01').detail).toMatch(/leave everything switched off/);
  });

  it('ends with every device’s management ports reachable', () => {
    const management = steps.filter((s) => s.phase === 'management');
    expect(steps.slice(-management.length)).toEqual(management);
    expect(management.map((s) => s.deviceId)).toEqual(['vault-1', ...[...HARBOR_ROAD_HOSTS].sort()]);
    // RFC 5737 §3 documentation range, from docs/demo.md's demo (management 192.0.2.0/24).
    expect(step('management', 'vault-1').detail).toContain('ctl-a mgmt: 192.0.2.2/24 on management, VLAN 10, MTU 1500');
  });
});

describe('each host', () => {
  it.each(HARBOR_ROAD_HOSTS)('%s: initiator, data ports, CHAP, discovery, login and multipath, in that order', (host) => {
    const own = steps.filter((s) => s.deviceId === host && s.phase === 'hosts');
    expect(own.map((s) => s.kind)).toEqual(['initiator', 'host-port', 'host-port', 'chap', 'discovery', 'login', 'multipath']);
    expect(own[0].detail).toContain(`iqn.2026-01.example.tidewater:${host}`); // RFC 7143 §4.2.7.4 iqn. names
  });

  it('gives each data port its address, VLAN and MTU', () => {
    // docs/demo.md's demo: fabric A 198.51.100.0/24 VLAN 110 MTU 9000; fabric B 203.0.113.0/24 VLAN 120 MTU 9000 (RFC 5737 §3).
    expect(step('host-port', 'wms-db-1.card-1.p1').detail).toBe('Set card-1 p1: 198.51.100.5/24 on fabric A, VLAN 110, MTU 9000.');
    expect(step('host-port', 'wms-db-1.card-2.p1').detail).toBe('Set card-2 p1: 203.0.113.5/24 on fabric B, VLAN 120, MTU 9000.');
    expect(byId.has(JSON.stringify(['host-port', 'wms-db-1.card-1.p2']))).toBe(false); // the spare port is not used
  });

  it('discovers the portals of its fabrics on TCP 3260', () => {
    const detail = step('discovery', 'wms-db-1').detail;
    expect(detail).toContain('TCP port 3260'); // RFC 7143 §15: the iSCSI well-known port
    // vault-1's eight data ports, two per controller on each fabric (docs/demo.md), each a portal address:3260.
    expect(detail.match(/\d+\.\d+\.\d+\.\d+:3260/g)).toHaveLength(8);
    expect(detail).toContain('198.51.100.1:3260');
    expect(detail).toContain('203.0.113.4:3260');
  });

  it('logs in exactly the sessions the analysis plans: 8 for every demo host', () => {
    for (const host of HARBOR_ROAD_HOSTS) {
      const login = step('login', host);
      expect(login.expectedSessions).toBe(plannedSessions(report, host));
      // Hand count from docs/demo.md: each host has one port on each fabric, and vault-1 two ports per
      // controller on each fabric: 2 host ports × 4 same-subnet controller ports = 8 sessions.
      expect(login.expectedSessions).toBe(8);
      expect(login.title).toBe(`Log ${host} in: 8 sessions`);
      expect(login.detail).toContain('the host must show exactly 8');
      expect(step('multipath', host).detail).toContain('each volume of vault-1 on 8 paths through ctl-a and ctl-b');
    }
  });

  it('follows the analysis when it plans fewer sessions: version 1’s cam-rec-2 reaches one fabric only', () => {
    const v1 = harborRoadV1();
    const v1Report = analyze(v1);
    const login = bringUpSteps(v1, v1Report).find((s) => s.id === JSON.stringify(['login', 'cam-rec-2']))!;
    expect(login.expectedSessions).toBe(plannedSessions(v1Report, 'cam-rec-2'));
    // docs/demo.md: v1 cables cam-rec-2 to fab-a only, so its one fabric-A port meets the 4 fabric-A controller ports.
    expect(login.expectedSessions).toBe(4);
  });

  it('asks the installer to stop when the analysis plans no session, and to name an initiator the design lacks', () => {
    const lonely: Topology = { ...doc, cables: doc.cables.filter((c) => !c.a.startsWith('cam-rec-1.') && !c.b.startsWith('cam-rec-1.')) };
    lonely.devices = lonely.devices.map((d) => (d.id === 'cam-rec-1' && d.kind === 'host' ? { ...d, iqn: undefined } : d));
    const list = bringUpSteps(lonely, analyze(lonely));
    const find = (kind: string) => list.find((s) => s.id === JSON.stringify([kind, 'cam-rec-1']))!;
    expect(find('login').expectedSessions).toBe(0);
    expect(find('login').detail).toMatch(/plans no sessions.*Tell the designer/);
    expect(find('discovery').detail).toMatch(/nothing to discover/);
    expect(find('initiator').detail).toMatch(/no initiator name.*RFC 7143 §4\.2\.7\.4/);
  });
});

describe('step ids', () => {
  it('are unique, derived from document ids only, and the same for the same document', () => {
    expect(new Set(steps.map((s) => s.id)).size).toBe(steps.length);
    expect(bringUpSteps(harborRoadV2(), analyze(harborRoadV2())).map((s) => s.id)).toEqual(steps.map((s) => s.id));
    const renamed = harborRoadV2();
    for (const device of renamed.devices) device.name = `${device.name} (renamed)`;
    expect(bringUpSteps(renamed, analyze(renamed)).map((s) => s.id)).toEqual(steps.map((s) => s.id));
  });

  it('stay unique and readable with hostile ids', () => {
    const pool = hostilePool();
    let next = 0;
    const hostile = renameIds(harborRoadV2(), () => pool[next++ % pool.length] + String(next));
    const list = bringUpSteps(hostile, analyze(hostile));
    expect(list).toHaveLength(steps.length);
    expect(new Set(list.map((s) => s.id)).size).toBe(list.length);
    for (const s of list) expect(Array.isArray(JSON.parse(s.id))).toBe(true);
  });

  it('gather devices without a rack into one mount and one power step', () => {
    const loose: Topology = { ...harborRoadV2(), racks: undefined };
    const list = bringUpSteps(loose, analyze(loose)).filter((s) => s.phase === 'racks');
    expect(list.map((s) => s.id)).toEqual([JSON.stringify(['rack']), JSON.stringify(['power'])]);
    expect(list[0].detail).toMatch(/not placed in a rack/);
  });
});
