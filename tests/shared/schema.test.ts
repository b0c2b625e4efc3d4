import fc from 'fast-check';
import { validateTopology, MAX_ISSUES } from '@/shared/topology/validate';
import type { Topology } from '@/shared/topology/schema';
import { Draft } from './helpers/draft';

// v ==v.a/v.b== fa == h1 (two cards): a small, valid document to break in one place per test.
function base(): Topology {
  return new Draft()
    .network('na', '198.51.100.0/24') // RFC 5737 §3 documentation range
    .array('v', { a: 1, b: 1 })
    .switch('fa')
    .host('h1', { c1: 1, c2: 1 })
    .link('v.a.1', 'fa')
    .link('v.b.1', 'fa')
    .link('h1.c1.1', 'fa')
    .link('h1.c2.1', 'fa')
    .build();
}

function issuesOf(input: unknown) {
  const result = validateTopology(input);
  if (result.ok) throw new Error('expected the document to be rejected');
  return result.issues;
}

describe('validateTopology rejects what makes a document unreadable, with paths', () => {
  it('accepts a well-formed document and returns it', () => {
    const result = validateTopology(base());
    expect(result.ok).toBe(true);
  });

  it('rejects an id used twice anywhere in the document', () => {
    const doc = base();
    doc.cables[1].id = 'h1.c1'; // a cable reusing a card's id
    expect(issuesOf(doc)).toEqual([{ path: 'cables.1.id', message: expect.stringContaining('already used by the card at devices.2.adapters.0') }]);
  });

  it('rejects a cable end that names no port, or names something that is not a port', () => {
    const doc = base();
    doc.cables[0].a = 'nowhere';
    doc.cables[1].b = 'fa';
    const issues = issuesOf(doc);
    expect(issues.map((i) => i.path)).toEqual(['cables.0.a', 'cables.1.b']);
    expect(issues[1].message).toContain('is a device, not a port');
  });

  it('rejects a cable from a port to itself', () => {
    const doc = base();
    doc.cables[0].b = doc.cables[0].a;
    expect(issuesOf(doc)).toContainEqual({ path: 'cables.0.b', message: expect.stringContaining('cannot join a port to itself') });
  });

  it('rejects unknown keys at their own path', () => {
    const doc = base() as unknown as { devices: { ports?: Record<string, unknown>[] }[]; colour?: string };
    doc.devices[1].ports![0].colour = 'teal';
    doc.colour = 'blue';
    expect(issuesOf(doc).map((i) => i.path).sort()).toEqual(['colour', 'devices.1.ports.0.colour']);
  });

  it('rejects wrong types and values outside the enumerations', () => {
    const doc = base() as unknown as Record<string, any>;
    doc.devices[1].ports[0].speedGbps = 7;
    doc.cables[0].media = 'cat7';
    doc.devices[0].controllers[0].name = 12;
    doc.devices[2].kind = 'router';
    const issues = issuesOf(doc);
    expect(issues.map((i) => i.path).sort()).toEqual([
      'cables.0.media',
      'devices.0.controllers.0.name',
      'devices.1.ports.0.speedGbps',
      'devices.2.kind',
    ]);
    expect(issues.find((i) => i.path === 'devices.1.ports.0.speedGbps')!.message).toBe(
      'The port speed (Gb/s) must be one of 1, 2.5, 5, 10, 25, 40, 50 or 100.',
    );
    expect(issues.find((i) => i.path === 'devices.0.controllers.0.name')!.message).toBe('The name must be text.');
  });

  it('names a missing required field as required', () => {
    const doc = base() as unknown as Record<string, any>;
    delete doc.cables[2].media;
    expect(issuesOf(doc)).toEqual([{ path: 'cables.2.media', message: 'The cable media is required.' }]);
  });

  it('rejects malformed addresses and CIDR blocks', () => {
    const doc = base();
    doc.devices[2].kind === 'host' && (doc.devices[2].adapters[0].ports[0].address = { mode: 'static', ip: '198.51.100.300' });
    doc.devices[2].kind === 'host' && (doc.devices[2].adapters[1].ports[0].address = { mode: 'static', ip: '198.51.100.7/24' });
    doc.networks[0].cidr = '198.51.100.0/33'; // an IPv4 prefix is at most 32 bits (RFC 4632)
    doc.networks.push({ id: 'nb', name: 'nb', purpose: 'data', cidr: '203.0.113/24' });
    expect(issuesOf(doc).map((i) => i.path)).toEqual([
      'devices.2.adapters.0.ports.0.address.ip',
      'devices.2.adapters.1.ports.0.address.ip',
      'networks.0.cidr',
      'networks.1.cidr',
    ]);
  });

  it('rejects a network reference on a switch port and references to things that are not networks', () => {
    const doc = base();
    if (doc.devices[1].kind === 'switch') doc.devices[1].ports[0].networkId = 'na';
    if (doc.devices[2].kind === 'host') doc.devices[2].adapters[0].ports[0].networkId = 'fa';
    expect(issuesOf(doc).map((i) => i.path)).toEqual(['devices.1.ports.0.networkId', 'devices.2.adapters.0.ports.0.networkId']);
  });

  it('rejects a layout entry for a device that does not exist', () => {
    const doc = { ...base(), layout: { v: { x: 1, y: 2 }, ghost: { x: 0, y: 0 } } };
    expect(issuesOf(doc).map((i) => i.path)).toEqual(['layout.ghost']);
  });

  it('rejects an array with no controllers or more than four', () => {
    const doc = base();
    if (doc.devices[0].kind === 'array') doc.devices[0].controllers = [];
    expect(issuesOf(doc).map((i) => i.path)).toEqual(['devices.0.controllers']);
    const crowded = base();
    if (crowded.devices[0].kind === 'array') {
      crowded.devices[0].controllers = Array.from({ length: 5 }, (_, i) => ({ id: `x${i}`, name: `x${i}`, ports: [] }));
    }
    expect(issuesOf(crowded)).toEqual([{ path: 'devices.0.controllers', message: 'The controller list can hold at most 4 controllers.' }]);
    expect(issuesOf(doc)[0].message).toBe('The controller list needs at least 1 controller.');
  });

  it('names a list entry that is not an object by what it should be', () => {
    const doc = base() as unknown as Record<string, any>;
    doc.devices[1] = 'fa';
    doc.cables[0] = 7;
    doc.layout = { v: 3 };
    expect(issuesOf(doc)).toEqual([
      { path: 'devices.1', message: 'The device must be an object.' },
      { path: 'cables.0', message: 'The cable must be an object.' },
      { path: 'layout.v', message: 'The position of "v" must be an object.' },
    ]);
  });

  it('keeps one id space for devices, controllers, cards, ports, cables and networks', () => {
    const kinds = {
      device: (d: Topology) => d.devices[1],
      controller: (d: Topology) => (d.devices[0].kind === 'array' ? d.devices[0].controllers[1] : undefined)!,
      card: (d: Topology) => (d.devices[2].kind === 'host' ? d.devices[2].adapters[1] : undefined)!,
      port: (d: Topology) => (d.devices[1].kind === 'switch' ? d.devices[1].ports[11] : undefined)!,
      cable: (d: Topology) => d.cables[3],
      network: (d: Topology) => d.networks[0],
    };
    for (const [first, takeFirst] of Object.entries(kinds)) {
      for (const [second, takeSecond] of Object.entries(kinds)) {
        if (first === second) continue;
        const doc = base();
        takeSecond(doc).id = takeFirst(doc).id;
        const issues = issuesOf(doc);
        // Exactly one problem: the second holder's id; references to it are not blamed as well.
        expect({ first, second, issues: issues.filter((i) => i.message.includes('already used')).length }).toEqual({ first, second, issues: 1 });
      }
    }
  });

  it('blames only the duplicate when a port and a network share an id', () => {
    const doc = base();
    doc.networks[0].id = 'v.a.1'; // the id of a controller port; the controller port still points at "na"
    if (doc.devices[0].kind === 'array') doc.devices[0].controllers[0].ports[0].networkId = 'v.a.1';
    expect(issuesOf(doc).map((i) => i.path)).toEqual(['networks.0.id']);
  });
});

describe('validateTopology leaves drafting mistakes to the analysis', () => {
  it('accepts VLAN and MTU out of range, a port cabled twice, an address outside its network, a bad initiator name, a cable too long or of the wrong media and a subnet with host bits set', () => {
    const doc = base();
    doc.networks[0].vlan = 5000; // outside IEEE 802.1Q 1–4094: a finding, not unreadable
    doc.networks[0].mtu = 20000;
    doc.cables.push({ id: 'k-extra', a: 'h1.c1.1', b: 'fa.9', media: 'cat6a' });
    doc.cables[0].lengthM = 500; // far past 10GBASE-T's 100 m (IEEE 802.3an): cable-too-long, a finding
    doc.cables[1].media = 'om4'; // fibre on RJ45 ports: connector-mismatch, a finding
    doc.networks.push({ id: 'nb', name: 'nb', purpose: 'management', cidr: '203.0.113.7/24' }); // host bits set: a finding
    if (doc.devices[2].kind === 'host') {
      doc.devices[2].iqn = 'iqn.2026-13.example_bad';
      doc.devices[2].adapters[0].ports[0].networkId = 'na';
      doc.devices[2].adapters[0].ports[0].address = { mode: 'static', ip: '203.0.113.9' };
    }
    expect(validateTopology(doc).ok).toBe(true);
  });

  it('accepts IPv6 addresses and networks', () => {
    const doc = base();
    doc.networks[0].cidr = '2001:db8:10::/64'; // RFC 3849 documentation prefix
    if (doc.devices[2].kind === 'host') doc.devices[2].adapters[0].ports[0].address = { mode: 'static', ip: '2001:db8:10::21' };
    expect(validateTopology(doc).ok).toBe(true);
  });
});

describe('validateTopology never throws', () => {
  it('answers any JSON value with a result', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (value) => {
        const result = validateTopology(value);
        expect(typeof result.ok).toBe('boolean');
      }),
      { numRuns: 300 },
    );
  });

  it('answers mutated valid documents with a result', () => {
    const doc = base();
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.nat(40), fc.jsonValue()), { maxLength: 4 }), (edits) => {
        const copy = JSON.parse(JSON.stringify(doc)) as Record<string, any>;
        for (const [at, value] of edits) {
          const targets = [copy, copy.devices?.[at % 3], copy.cables?.[at % 4], copy.networks?.[0]];
          const target = targets[at % targets.length];
          if (!target || typeof target !== 'object') continue;
          const keys = Object.keys(target);
          target[keys[at % keys.length]] = value;
        }
        const result = validateTopology(copy);
        if (!result.ok) for (const issue of result.issues) expect(typeof issue.path).toBe('string');
      }),
      { numRuns: 300 },
    );
  });

  it('survives deep nesting and huge arrays, and caps the issue list', () => {
    let deep: unknown = {};
    for (let i = 0; i < 100000; i += 1) deep = { devices: [deep] };
    expect(validateTopology(deep).ok).toBe(false);
    // Under the device limit (size-limits.ts), so every entry is read and the list must be capped.
    const huge = { ...base(), devices: Array.from({ length: 40000 }, () => ({ kind: 'router' })) };
    const result = validateTopology(huge);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.issues).toHaveLength(MAX_ISSUES);
      expect(result.issues[MAX_ISSUES - 1].message).toContain('more problems');
    }
  });
});
