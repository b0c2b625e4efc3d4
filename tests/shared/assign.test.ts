import { analyze } from '@/shared/analysis/analyze';
import { assignPortAddresses } from '@/shared/topology/assign';
import { twoFabrics } from './helpers/topologies';

describe('assigning port addresses', () => {
  it('gives every port on a network the lowest free address, skipping the gateway and taken ones', () => {
    const d = twoFabrics();
    d.doc.networks[0].gateway = '198.51.100.1';
    d.port('v.b.1').address = { mode: 'static', ip: '198.51.100.2' };
    const doc = assignPortAddresses(d.build(), { networkIds: ['na'] });
    const ip = (id: string) => {
      for (const dev of doc.devices) {
        const groups = dev.kind === 'array' ? dev.controllers : dev.kind === 'host' ? dev.adapters : [];
        for (const g of groups) for (const p of g.ports) if (p.id === id) return p.address;
      }
    };
    expect(ip('v.a.1')).toEqual({ mode: 'static', ip: '198.51.100.3' }); // .0 network (RFC 4632), .1 gateway, .2 taken
    expect(ip('v.b.1')).toEqual({ mode: 'static', ip: '198.51.100.2' });
    expect(ip('h1.c1.1')).toEqual({ mode: 'static', ip: '198.51.100.4' });
    expect(ip('v.a.2')).toBeUndefined(); // fabric B was not asked for
  });

  it('leaves the input untouched and clears the unaddressed-port findings', () => {
    const before = twoFabrics().build();
    const snapshot = JSON.stringify(before);
    const after = assignPortAddresses(before);
    expect(JSON.stringify(before)).toBe(snapshot);
    expect(analyze(before).findings.some((f) => f.rule === 'port-unaddressed')).toBe(true);
    expect(analyze(after).findings.filter((f) => f.rule.startsWith('address') || f.rule === 'port-unaddressed')).toEqual([]);
  });

  it('renumbers everything with overwrite, deterministically', () => {
    const d = twoFabrics();
    d.port('h1.c1.1').address = { mode: 'static', ip: '198.51.100.200' };
    const once = assignPortAddresses(d.build(), { overwrite: true });
    expect(JSON.stringify(assignPortAddresses(d.build(), { overwrite: true }))).toBe(JSON.stringify(once));
    const host = once.devices.find((x) => x.id === 'h1');
    expect(host?.kind === 'host' && host.adapters[0].ports[0].address).toEqual({ mode: 'static', ip: '198.51.100.3' });
  });
});
