import { runCommand, type CommandArgs, type CommandName } from '@/lib/editor/commands';
import type { Device, Port, Topology } from '@/shared/topology/schema';
import { TOPOLOGY_FORMAT } from '@/shared/topology/schema';
import { validateTopology } from '@/shared/topology/validate';

/** Freezes a value and everything inside it, so any mutation by a command throws in strict mode. */
export function deepFreeze<T>(value: T): T {
  if (value && typeof value === 'object' && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const key of Object.keys(value)) deepFreeze((value as Record<string, unknown>)[key]);
  }
  return value;
}

/** Fails the test with the validator's own sentences when a document is not valid. */
export function expectValid(doc: Topology): Topology {
  const result = validateTopology(doc);
  if (!result.ok) throw new Error(`invalid document:\n${result.issues.map((i) => `${i.path}: ${i.message}`).join('\n')}`);
  return doc;
}

/**
 * Runs a command by name the way the store does, on a deeply frozen input (so it cannot mutate
 * it), and checks that the result passes validateTopology. Every command test goes through this.
 */
export function apply<K extends CommandName>(doc: Topology, name: K, args: CommandArgs[K]): Topology {
  const before = JSON.stringify(doc);
  const next = runCommand(deepFreeze(doc), name, args);
  expect(JSON.stringify(doc)).toBe(before);
  return expectValid(next);
}

export function blank(name = 'test design'): Topology {
  return { format: TOPOLOGY_FORMAT, name, devices: [], cables: [], networks: [] };
}

export function device(doc: Topology, id: string): Device {
  const found = doc.devices.find((d) => d.id === id);
  if (!found) throw new Error(`no device ${id}`);
  return found;
}

export function allPorts(doc: Topology): { port: Port; device: Device }[] {
  return doc.devices.flatMap((d) => {
    const ports = d.kind === 'switch' ? d.ports : (d.kind === 'array' ? d.controllers : d.adapters).flatMap((g) => g.ports);
    return ports.map((port) => ({ port, device: d }));
  });
}

export function port(doc: Topology, id: string): Port {
  const found = allPorts(doc).find((p) => p.port.id === id);
  if (!found) throw new Error(`no port ${id}`);
  return found.port;
}

/**
 * The small design most tests start from, built with the commands themselves:
 *   host-1 (card-1, card-2, onboard) · host-2 — switch-1, switch-2 (data) — array-1 (ctl-a, ctl-b × 2 ports + mgmt)
 * nothing cabled, no networks.
 */
export function smallDesign(): Topology {
  let doc = blank();
  doc = runCommand(doc, 'addDevice', { template: 'array', options: { dataPorts: 2 }, position: { x: 0, y: 600 } });
  doc = runCommand(doc, 'addDevice', { template: 'data-switch', options: { ports: 12 }, position: { x: 0, y: 300 } });
  doc = runCommand(doc, 'addDevice', { template: 'data-switch', options: { ports: 12 }, position: { x: 700, y: 300 } });
  doc = runCommand(doc, 'addDevice', { template: 'host', position: { x: 0, y: 0 } });
  doc = runCommand(doc, 'addDevice', { template: 'host', position: { x: 500, y: 0 } });
  return doc;
}

/** The CommandError a call throws; fails the test when it does not throw one. */
export function refusal(fn: () => unknown): import('@/lib/editor/errors').CommandError {
  try {
    fn();
  } catch (error) {
    if (error instanceof Error && error.name === 'CommandError') return error as import('@/lib/editor/errors').CommandError;
    throw error;
  }
  throw new Error('expected the command to be refused, but it ran');
}
