import ipaddr from 'ipaddr.js';
import { analyze } from '@/shared/analysis/analyze';
import { dualFabric } from '@/shared/patterns';
import type { Topology } from '@/shared/topology/schema';
import { portsInScope } from '@/lib/editor/commands';
import { editorStore } from '@/lib/editor/store';
import { allPorts, apply, refusal } from '@/tests/lib/editor/helpers/editor';

/** The dual-fabric pattern with no port on any network and no address: what a designer draws by hand. */
function bare(): Topology {
  const doc = dualFabric({ hosts: 6, controllerPorts: 4, assignAddresses: false });
  const ids = allPorts(doc).filter((p) => p.device.kind !== 'switch').map((p) => p.port.id);
  return apply(doc, 'assignNetwork', { portIds: ids, networkId: null });
}

const ADDRESS_RULES = /^(address-|port-unaddressed|cidr-|network-unusable)/;

/** Every controller address below every host address on each network, compared as numbers (ipaddr.js). */
function targetsBelowHosts(doc: Topology): void {
  const value = (ip: string) => ipaddr.parse(ip).toByteArray().reduce((n, b) => n * 256 + b, 0);
  for (const network of doc.networks) {
    const on = allPorts(doc).filter((p) => p.port.networkId === network.id && p.port.address?.mode === 'static');
    const targets = on.filter((p) => p.device.kind === 'array').map((p) => value((p.port.address as { ip: string }).ip));
    const hosts = on.filter((p) => p.device.kind === 'host').map((p) => value((p.port.address as { ip: string }).ip));
    expect(targets.length).toBeGreaterThan(0);
    expect(hosts.length).toBeGreaterThan(0);
    // Targets in a low block, hosts in a high block of each network (common practice).
    expect(Math.max(...targets)).toBeLessThan(Math.min(...hosts));
  }
}

describe('bulk network assignment', () => {
  it('puts a fabric’s and a switch’s neighbours on their networks with addresses: no address finding, targets below hosts', () => {
    let doc = bare();
    expect(analyze(doc).findings.some((f) => f.rule === 'port-unaddressed')).toBe(true);
    doc = apply(doc, 'bulkAssignNetwork', { scope: { kind: 'fabric', id: 'fab-a' }, networkId: 'net-fabric-a' });
    doc = apply(doc, 'bulkAssignNetwork', { scope: { kind: 'switch', id: 'fab-b' }, networkId: 'net-fabric-b' });
    const findings = analyze(doc).findings.filter((f) => ADDRESS_RULES.test(f.rule));
    expect(findings).toEqual([]);
    targetsBelowHosts(doc);
    // Every cabled data port of the array and the hosts is on the network of its switch.
    for (const cable of doc.cables) {
      const [a, b] = [cable.a, cable.b].map((id) => allPorts(doc).find((p) => p.port.id === id)!);
      const end = a.device.kind === 'switch' ? b : a;
      const sw = a.device.kind === 'switch' ? a : b;
      if (end.device.kind === 'switch') continue;
      expect(end.port.networkId).toBe(sw.device.id === 'fab-a' ? 'net-fabric-a' : 'net-fabric-b');
    }
  });

  it('is one undo step in the editor', () => {
    editorStore.getState().load(bare(), { designId: 1, baseVersion: 1, readOnly: false });
    const before = editorStore.getState().doc;
    editorStore.getState().run('bulkAssignNetwork', { scope: { kind: 'switch', id: 'fab-a' }, networkId: 'net-fabric-a' });
    expect(editorStore.getState().doc).not.toBe(before);
    editorStore.getState().undo();
    expect(editorStore.getState().doc).toEqual(before);
  });

  it('takes a selection’s data ports (devices, cards, ports; a switch for its neighbours), never a management port', () => {
    const doc = bare();
    expect(portsInScope(doc, { kind: 'selection', ids: ['host-1'] })).toEqual(
      allPorts(doc).filter((p) => p.device.id === 'host-1' && p.port.role === 'data').map((p) => p.port.id),
    );
    const mixed = portsInScope(doc, { kind: 'selection', ids: ['host-2.card-1.p1', 'fab-b'] });
    expect(mixed).toContain('host-2.card-1.p1');
    expect(mixed).toEqual(expect.arrayContaining(portsInScope(doc, { kind: 'switch', id: 'fab-b' })));
    expect(allPorts(doc).filter((p) => mixed.includes(p.port.id)).every((p) => p.port.role === 'data' && p.device.kind !== 'switch')).toBe(true);
    expect(refusal(() => apply(doc, 'bulkAssignNetwork', { scope: { kind: 'switch', id: 'host-1' }, networkId: 'net-fabric-a' })).code).toBe('wrong-kind');
    expect(refusal(() => apply(doc, 'bulkAssignNetwork', { scope: { kind: 'fabric', id: 'nowhere' }, networkId: 'net-fabric-a' })).code).toBe('not-found');
    expect(refusal(() => apply(doc, 'bulkAssignNetwork', { scope: { kind: 'switch', id: 'fab-a' }, networkId: 'net-nowhere' })).code).toBe('not-found');
  });

  it('follows inter-switch cables for a fabric: a stacked pair counts as one', () => {
    let doc = bare();
    doc = apply(doc, 'cablePorts', { a: allPorts(doc).filter((p) => p.device.id === 'fab-a').at(-1)!.port.id, b: allPorts(doc).filter((p) => p.device.id === 'fab-b').at(-1)!.port.id });
    const fabric = portsInScope(doc, { kind: 'fabric', id: 'fab-a' });
    expect(fabric.length).toBe(portsInScope(doc, { kind: 'switch', id: 'fab-a' }).length + portsInScope(doc, { kind: 'switch', id: 'fab-b' }).length);
  });
});
