import { TOPOLOGY_FORMAT, type Cable, type Device, type Port, type SwitchDevice, type Topology } from '@/shared/topology/schema';

/**
 * A large design written as tightly as the format allows, so that 20,000 hosts fit in a save's
 * 10 MB body (the benchmark's synthetic design, with names, addresses and target names, is about
 * 23 MB at that size): two fabrics, each a ring of switches; four arrays of two controllers, each
 * controller port on a switch of its fabric; every host with two cards of one port each, one per
 * fabric, so every host reaches every array redundantly. Host ids are short base-36 numbers
 * (lower case); everything else has an upper-case letter no base-36 digit can be, so ids never clash.
 */
const HOSTS_PER_SWITCH = 46;

const port = (id: string): Port => ({ id, name: '', role: 'data', speedGbps: 10, connector: 'sfp' });

export function compactDesign(hostCount: number): Topology {
  const ring = Math.max(3, Math.ceil(hostCount / HOSTS_PER_SWITCH));
  const devices: Device[] = [];
  const cables: Cable[] = [];
  const switches = new Map<string, SwitchDevice>();
  const b36 = (n: number) => n.toString(36);
  /** The next free port of a switch, made as it is used. */
  const next = (sw: string): string => {
    const device = switches.get(sw)!;
    const id = `${sw}.${b36(device.ports.length + 1)}`;
    device.ports.push(port(id));
    return id;
  };
  const cable = (a: string, b: string) => cables.push({ id: `C${b36(cables.length)}`, a, b, media: 'dac' });

  for (const f of ['A', 'B']) {
    for (let s = 0; s < ring; s += 1) {
      const sw: SwitchDevice = { id: `${f}${b36(s)}`, kind: 'switch', name: '', role: 'data', ports: [] };
      switches.set(sw.id, sw);
      devices.push(sw);
    }
    for (let s = 0; s < ring; s += 1) cable(next(`${f}${b36(s)}`), next(`${f}${b36((s + 1) % ring)}`));
  }
  for (let k = 0; k < 4; k += 1) {
    devices.push({
      id: `V${k}`,
      kind: 'array',
      name: `array ${k + 1}`,
      controllers: ['X', 'Y'].map((c) => ({ id: `V${k}${c}`, name: c, ports: [port(`V${k}${c}1`), port(`V${k}${c}2`)] })),
    });
    ['X', 'Y'].forEach((c, ci) => {
      const at = b36(((k * 2 + ci) * Math.floor(ring / 8)) % ring);
      cable(`V${k}${c}1`, next(`A${at}`));
      cable(`V${k}${c}2`, next(`B${at}`));
    });
  }
  for (let h = 0; h < hostCount; h += 1) {
    const id = b36(h);
    const s = b36(Math.floor(h / HOSTS_PER_SWITCH) % ring);
    devices.push({ id, kind: 'host', name: '', adapters: ['A', 'B'].map((c) => ({ id: `${id}${c}`, name: '', ports: [port(`${id}${c}P`)] })) });
    cable(`${id}AP`, next(`A${s}`));
    cable(`${id}BP`, next(`B${s}`));
  }
  return { format: TOPOLOGY_FORMAT, name: `compact ${hostCount}`, devices, cables, networks: [] };
}
