import { Draft } from './draft';

/**
 * Named test topologies. Each drawing reads left to right: `==` a cable, `c1` a host card,
 * `v.a`/`v.b` the two controllers of array v, `fa`/`fb` data switches, `-isl-` an inter-switch cable.
 */

/** h1 ==c1== v.a ; h1 ==c2== v.b */
export const directAttachTwoCards = () =>
  new Draft().array('v', { a: 1, b: 1 }).host('h1', { c1: 1, c2: 1 }).link('h1.c1.1', 'v.a.1').link('h1.c2.1', 'v.b.1').build();

/** h1 ==c1.1== v.a ; h1 ==c1.2== v.b   (one dual-port card) */
export const directAttachOneDualPortCard = () =>
  new Draft().array('v', { a: 1, b: 1 }).host('h1', { c1: 2 }).link('h1.c1.1', 'v.a.1').link('h1.c1.2', 'v.b.1').build();

/** h1 ==c1,c2== fa == v.a, v.b */
export const oneSwitch = () =>
  new Draft()
    .array('v', { a: 1, b: 1 })
    .switch('fa')
    .host('h1', { c1: 1, c2: 1 })
    .link('v.a.1', 'fa')
    .link('v.b.1', 'fa')
    .link('h1.c1.1', 'fa')
    .link('h1.c2.1', 'fa')
    .build();

/** h1 ==c1== fa(na) == v.a.1, v.b.1 ; h1 ==c2== fb(nb) == v.a.2, v.b.2 */
export const twoFabrics = () => {
  const d = new Draft()
    .network('na', '198.51.100.0/24', { vlan: 110, mtu: 9000 })
    .network('nb', '203.0.113.0/24', { vlan: 120, mtu: 9000 })
    .array('v', { a: [{ networkId: 'na' }, { networkId: 'nb' }], b: [{ networkId: 'na' }, { networkId: 'nb' }] })
    .switch('fa')
    .switch('fb')
    .host('h1', { c1: [{ networkId: 'na' }], c2: [{ networkId: 'nb' }] })
    .link('v.a.1', 'fa')
    .link('v.b.1', 'fa')
    .link('v.a.2', 'fb')
    .link('v.b.2', 'fb')
    .link('h1.c1.1', 'fa')
    .link('h1.c2.1', 'fb');
  return d;
};

/** twoFabrics, but h1's fabric-B port is addressed for fabric A: h1 ==c2(na!)== fb(nb) */
export const wrongFabricAddress = () => {
  const d = twoFabrics();
  d.port('h1.c2.1').networkId = 'na';
  return d.build();
};

/** h1 ==c1== fa -isl- fb ; h1 ==c2== fb ; v.a == fa ; v.b == fb */
export const interSwitchLink = () =>
  new Draft()
    .array('v', { a: 1, b: 1 })
    .switch('fa')
    .switch('fb')
    .host('h1', { c1: 1, c2: 1 })
    .link('v.a.1', 'fa')
    .link('v.b.1', 'fb')
    .link('fa', 'fb', { id: 'isl' })
    .link('h1.c1.1', 'fa')
    .link('h1.c2.1', 'fb')
    .build();

/** h1 ==c1,c2== s1 -k3- s2 -k4- s3 == v.a, v.b */
export const switchChain = () =>
  new Draft()
    .array('v', { a: 1, b: 1 })
    .switch('s1')
    .switch('s2')
    .switch('s3')
    .host('h1', { c1: 1, c2: 1 })
    .link('h1.c1.1', 's1')
    .link('h1.c2.1', 's1')
    .link('s1', 's2')
    .link('s2', 's3')
    .link('v.a.1', 's3')
    .link('v.b.1', 's3')
    .build();

/** h1 ==c1,c2== fa -k3- oob(management) -k4- fb == v.a, v.b */
export const managementSwitchInPath = () =>
  new Draft()
    .array('v', { a: 1, b: 1 })
    .switch('fa')
    .switch('oob', 'management')
    .switch('fb')
    .host('h1', { c1: 1, c2: 1 })
    .link('h1.c1.1', 'fa')
    .link('h1.c2.1', 'fa')
    .link('fa', 'oob')
    .link('oob', 'fb')
    .link('v.a.1', 'fb')
    .link('v.b.1', 'fb')
    .build();

/** h1 ==c1== fa == v.a.1 ; h1 ==c2== fb == v.a.2 ; v.b uncabled */
export const oneControllerCabled = () =>
  new Draft()
    .array('v', { a: 2, b: 2 })
    .switch('fa')
    .switch('fb')
    .host('h1', { c1: 1, c2: 1 })
    .link('v.a.1', 'fa')
    .link('v.a.2', 'fb')
    .link('h1.c1.1', 'fa')
    .link('h1.c2.1', 'fb')
    .build();

/** h2 ==c1== fa ==c1== h1 ==c2== fb == v.a, v.b   (h1 must not carry h2's traffic) */
export const hostsDoNotForward = () =>
  new Draft()
    .array('v', { a: 1, b: 1 })
    .switch('fa')
    .switch('fb')
    .host('h1', { c1: 1, c2: 1 })
    .host('h2', { c1: 1 })
    .link('v.a.1', 'fb')
    .link('v.b.1', 'fb')
    .link('h1.c1.1', 'fa')
    .link('h1.c2.1', 'fb')
    .link('h2.c1.1', 'fa')
    .build();

/** h1 ==c1== sh(shared) == v.a ; h1 ==c2== fb == v.b */
export const sharedSwitch = () =>
  new Draft()
    .array('v', { a: 1, b: 1 })
    .switch('sh', 'shared')
    .switch('fb')
    .host('h1', { c1: 1, c2: 1 })
    .link('v.a.1', 'sh')
    .link('v.b.1', 'fb')
    .link('h1.c1.1', 'sh')
    .link('h1.c2.1', 'fb')
    .link('sh', 'fb', { id: 'isl' })
    .build();

/** h1 ==c1== fa == v1.a, v2.a ; h1 ==c2== fb == v1.b   (v2 hangs on fabric A only) */
export const twoArrays = () =>
  new Draft()
    .array('v1', { a: 1, b: 1 })
    .array('v2', { a: 1, b: 1 })
    .switch('fa')
    .switch('fb')
    .host('h1', { c1: 1, c2: 1 })
    .link('v1.a.1', 'fa')
    .link('v1.b.1', 'fb')
    .link('v2.a.1', 'fa')
    .link('v2.b.1', 'fa')
    .link('h1.c1.1', 'fa')
    .link('h1.c2.1', 'fb')
    .build();

/** v.a.2 (management) =k1= fa (data) ; h1.c1.1 (data) =k2= oob (management) ; oob -k3- fa ; h1.onboard.1 (management) =k4= fa */
export const managementDataMixing = () =>
  new Draft()
    .array('v', { a: [{}, { role: 'management', speedGbps: 1 }], b: 1 })
    .switch('fa')
    .switch('oob', 'management')
    .host('h1', { c1: 1, c2: 1, onboard: [{ role: 'management', speedGbps: 1 }] })
    .link('v.a.2', 'fa')
    .link('h1.c1.1', 'oob')
    .link('oob', 'fa')
    .link('h1.onboard.1', 'fa')
    .build();
