import { analyze } from '@/shared/analysis/analyze';
import { summarize } from '@/shared/analysis/summary';
import { Draft } from './helpers/draft';
import { oneSwitch, twoFabrics } from './helpers/topologies';

describe('report summary', () => {
  it('counts a unit that cuts off several hosts once', () => {
    // h1, h2 ==c1,c2== fa == v.a, v.b : fa cuts off both hosts
    const doc = new Draft()
      .array('v', { a: 1, b: 1 })
      .switch('fa')
      .host('h1', { c1: 1, c2: 1 })
      .host('h2', { c1: 1, c2: 1 })
      .link('v.a.1', 'fa')
      .link('v.b.1', 'fa')
      .link('h1.c1.1', 'fa')
      .link('h1.c2.1', 'fa')
      .link('h2.c1.1', 'fa')
      .link('h2.c2.1', 'fa')
      .build();
    const summary = summarize(analyze(doc), doc);
    expect(summary.singlePointsOfFailure).toBe(1);
    expect(summary).toMatchObject({ hosts: 2, redundantHosts: 0 });
  });

  it('counts only hosts with data ports, and an unreachable host as not redundant', () => {
    // twoFabrics (h1 redundant) + h2 with an uncabled data card + a host with only a management port
    const doc = twoFabrics().host('h2', { c1: 1 }).build();
    doc.devices.push({ id: 'jump', kind: 'host', name: 'jump', adapters: [{ id: 'jump.m', name: 'm', ports: [{ id: 'jump.m.1', name: '1', role: 'management', speedGbps: 1, connector: 'rj45' }] }] });
    const summary = summarize(analyze(doc), doc);
    expect(summary).toMatchObject({ hosts: 2, redundantHosts: 1 });
  });

  it('counts errors and warnings but not info findings', () => {
    // oneSwitch: error single-point-of-failure (fa); warnings chap-off and port-unaddressed on its
    // four cabled ports, none of which has a network; info iqn-missing for h1.
    const doc = oneSwitch();
    expect(summarize(analyze(doc), doc)).toEqual({ errors: 1, warnings: 5, singlePointsOfFailure: 1, hosts: 1, redundantHosts: 0 });
  });
});
