import fc from 'fast-check';
import * as functions from '@/lib/editor/commands/functions';
import { COMMAND_NAMES, COMMANDS, runCommand } from '@/lib/editor/commands';
import { CommandError } from '@/lib/editor/errors';
import { TEMPLATE_IDS } from '@/lib/editor/templates';
import { MEDIA, PORT_SPEEDS, type Topology } from '@/shared/topology/schema';
import { allPorts, blank, deepFreeze, expectValid, refusal, smallDesign } from '@/tests/lib/editor/helpers/editor';

describe('the command registry', () => {
  it('names every plain command function, and nothing else', () => {
    expect([...COMMAND_NAMES].sort()).toEqual(Object.keys(functions).sort());
    for (const name of COMMAND_NAMES) expect(COMMANDS.get(name)!.run).toBe((functions as Record<string, unknown>)[name]);
  });

  it('refuses an unknown command by name', () => {
    expect(refusal(() => runCommand(blank(), 'formatDisk', {})).code).toBe('unknown-command');
  });

  it('checks arguments with the command schema and names the field at fault', () => {
    const error = refusal(() => runCommand(smallDesign(), 'cablePorts', { a: 'switch-1-p1', b: 7 }));
    expect([error.code, error.path]).toEqual(['bad-args', 'args.b']);
    expect(refusal(() => runCommand(smallDesign(), 'moveDevice', { id: 'host-1', x: Number.NaN, y: 0 })).path).toBe('args.x');
    expect(refusal(() => runCommand(smallDesign(), 'deleteDevices', { ids: ['host-1'], extra: true })).code).toBe('bad-args');
  });
});

/**
 * Random edit sessions: each step picks a command and arguments from what the current document
 * holds. Whatever happens, no input is mutated, refusals are CommandErrors, and every result is
 * a valid document.
 */
const CIDRS = ['198.51.100.0/24', '203.0.113.0/25', '192.0.2.0/30', '2001:db8:a::/64']; // RFC 5737, RFC 3849

type Step = (doc: Topology, n: number[]) => [string, unknown];

const pick = <T>(list: readonly T[], n: number): T | undefined => (list.length ? list[n % list.length] : undefined);
const portIds = (doc: Topology) => allPorts(doc).map((p) => p.port.id);
const hostPortIds = (doc: Topology) => allPorts(doc).filter((p) => p.device.kind !== 'switch').map((p) => p.port.id);

const STEPS: Step[] = [
  (doc, [a]) => ['addDevice', { template: pick(TEMPLATE_IDS, a) }],
  (doc, [a]) => ['deleteDevices', { ids: [pick(doc.devices, a)?.id ?? 'none'] }],
  (doc, [a, b, c]) => ['cablePorts', { a: pick(portIds(doc), a) ?? 'x', b: pick(portIds(doc), b) ?? 'y', media: pick(MEDIA, c), lengthM: (c % 30) + 1 }],
  (doc, [a]) => ['uncable', { ids: [pick(doc.cables, a)?.id ?? 'none'] }],
  (doc, [a, b, c]) => ['setPort', { id: pick(portIds(doc), a) ?? 'x', networkId: b % 3 === 0 ? null : pick(doc.networks, b)?.id, speedGbps: pick(PORT_SPEEDS, c) }],
  (doc, [a, b]) => ['setPort', { id: pick(hostPortIds(doc), a) ?? 'x', networkId: pick(doc.networks, b)?.id ?? null }],
  (doc, [a, b]) => ['addNetwork', { name: `net ${a}`, purpose: b % 2 ? 'data' : 'management', cidr: pick(CIDRS, a) }],
  (doc, [a]) => ['removeNetwork', { id: pick(doc.networks, a)?.id ?? 'none' }],
  (doc, [a, b]) => ['updateNetwork', { id: pick(doc.networks, a)?.id ?? 'none', cidr: pick(CIDRS, b), readdress: true }],
  () => ['autoAssignAddresses', {}],
  (doc, [a]) => ['addController', { arrayId: pick(doc.devices.filter((d) => d.kind === 'array'), a)?.id ?? 'none' }],
  (doc, [a]) => ['removeController', { id: pick(doc.devices.flatMap((d) => (d.kind === 'array' ? d.controllers : [])), a)?.id ?? 'none' }],
  (doc, [a]) => ['addAdapter', { hostId: pick(doc.devices.filter((d) => d.kind === 'host'), a)?.id ?? 'none' }],
  (doc, [a]) => ['removeAdapter', { id: pick(doc.devices.flatMap((d) => (d.kind === 'host' ? d.adapters : [])), a)?.id ?? 'none' }],
  (doc, [a]) => ['removePort', { id: pick(portIds(doc), a) ?? 'x' }],
  (doc, [a, b]) => ['addPort', { ownerId: pick([...doc.devices.filter((d) => d.kind === 'switch').map((d) => d.id), ...doc.devices.flatMap((d) => (d.kind === 'host' ? d.adapters : d.kind === 'array' ? d.controllers : []).map((g) => g.id))], a) ?? 'none', role: b % 2 ? 'data' : 'management' }],
  (doc, [a, b, c]) => ['moveDevice', { id: pick(doc.devices, a)?.id ?? 'none', x: b * 20, y: c * 20 }],
  (doc, [a, b]) => ['renamePart', { id: pick(portIds(doc), a) ?? 'x', name: `port ${b}` }],
  (doc, [a, b]) => ['setCable', { id: pick(doc.cables, a)?.id ?? 'none', lengthM: b % 2 ? null : b + 1, label: b % 3 ? null : `L${b}` }],
  (doc, [a]) => ['uncablePort', { portId: pick(portIds(doc), a) ?? 'x' }],
];

describe('random edit sessions', () => {
  it('never mutate their input and always leave a valid document', () => {
    const step = fc.tuple(fc.nat(STEPS.length - 1), fc.nat(1000), fc.nat(1000), fc.nat(1000));
    const outcomes = { changed: 0, refused: 0 };
    fc.assert(
      fc.property(fc.array(step, { minLength: 1, maxLength: 30 }), (steps) => {
        let doc = deepFreeze(smallDesign());
        for (const [which, a, b, c] of steps) {
          const [name, args] = STEPS[which](doc, [a, b, c]);
          // The input is frozen: a command that writes to it throws a TypeError, which fails here.
          try {
            const next = deepFreeze(expectValid(runCommand(doc, name, args)));
            if (next !== doc) outcomes.changed += 1;
            doc = next;
          } catch (error) {
            if (!(error instanceof CommandError)) throw error;
            outcomes.refused += 1;
          }
        }
      }),
      { numRuns: 60 },
    );
    // The sessions must mostly edit, or the property says little.
    expect(outcomes.changed).toBeGreaterThan(outcomes.refused);
  });
});
