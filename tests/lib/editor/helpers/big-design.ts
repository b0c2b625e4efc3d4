import { runCommand } from '@/lib/editor/commands';
import type { Topology } from '@/shared/topology/schema';
import { blank, allPorts } from '@/tests/lib/editor/helpers/editor';

/**
 * The canvas benchmark's size: 300 devices and 600 cables — 10 arrays, 40 data switches of 48
 * ports, 250 hosts with two dual-port cards — each host cabled from both cards to two switches,
 * each array controller port to a switch. Deterministic.
 */
export function bigDesign(): Topology {
  let doc = blank('benchmark');
  for (let i = 0; i < 10; i += 1) doc = runCommand(doc, 'addDevice', { template: 'array', options: { controllers: 2, dataPorts: 5 }, position: { x: i * 600, y: 1200 } });
  for (let i = 0; i < 40; i += 1) doc = runCommand(doc, 'addDevice', { template: 'data-switch', options: { ports: 48 }, position: { x: i * 700, y: 600 } });
  for (let i = 0; i < 250; i += 1) doc = runCommand(doc, 'addDevice', { template: 'host', position: { x: (i % 50) * 320, y: -Math.floor(i / 50) * 200 } });
  const switchPorts = doc.devices.filter((d) => d.kind === 'switch').map((d) => (d.kind === 'switch' ? d.ports.map((p) => p.id) : []));
  const next = switchPorts.map(() => 0);
  const take = (s: number) => switchPorts[s][next[s]++];
  const cables: Topology['cables'] = [];
  const add = (a: string, b: string) => cables.push({ id: `cable-${cables.length + 1}`, a, b, media: 'cat6a' });
  const ports = allPorts(doc);
  for (let h = 0; h < 250; h += 1) {
    add(`host-${h + 1}-card-1-p1`, take((2 * h) % 40));
    add(`host-${h + 1}-card-2-p1`, take((2 * h + 1) % 40));
  }
  for (const { port, device } of ports) {
    if (device.kind === 'array' && port.role === 'data' && cables.length < 600) add(port.id, take(cables.length % 40));
  }
  return { ...doc, cables };
}
