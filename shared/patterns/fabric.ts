import { PatternBuilder, switchSize, type PortSpec } from '@/shared/patterns/builder';
import {
  controllerName,
  dataMedia,
  DEFAULTS,
  hostNames,
  type ManagedFabricOptions,
} from '@/shared/patterns/options';
import type { Topology } from '@/shared/topology/schema';

/**
 * Dual fabric: two data switches, one subnet each; every controller has ports on both fabrics
 * (odd ports on fabric A, even on fabric B) and every host one storage port per fabric, on
 * different cards when it has two or more. With `management`, controllers and hosts also get a
 * management port on a separate management switch and network (out of band).
 */
type Plan = { name: string; cidr: string; vlan?: number; mtu?: number; gateway?: string };

/** The storage ports of a host: port 1 of each card, alternating fabrics; one card uses its ports 1 and 2. */
function storagePorts(cards: number, ports: number): { card: number; port: number; fabric: 0 | 1 }[] {
  if (cards >= 2) return Array.from({ length: cards }, (_, c) => ({ card: c, port: 0, fabric: (c % 2) as 0 | 1 }));
  return Array.from({ length: Math.min(ports, 2) }, (_, p) => ({ card: 0, port: p, fabric: (p % 2) as 0 | 1 }));
}

export function buildFabric(options: ManagedFabricOptions, withManagement: boolean): Topology {
  const names = hostNames(options.hosts);
  const cards = Math.max(1, options.cardsPerHost ?? DEFAULTS.cardsPerHost);
  const perCard = Math.max(1, options.portsPerCard ?? DEFAULTS.portsPerCard);
  const speedGbps = options.speedGbps ?? DEFAULTS.speedGbps;
  const connector = options.connector ?? DEFAULTS.connector;
  const media = dataMedia(options);
  const arrayId = options.arrayName ?? DEFAULTS.arrayName;
  const controllerCount = Math.min(4, Math.max(1, options.controllers ?? DEFAULTS.controllers));
  const controllerPorts = Math.max(2, options.controllerPorts ?? 2);
  const [swA, swB] = options.switchNames ?? ['fab-a', 'fab-b'];
  const oob = options.managementSwitchName ?? 'oob-1';
  const lengthOf = options.hostCableLengthM ?? (() => 3);
  const b = new PatternBuilder(options.name ?? 'Dual fabric', options.labelPrefix ?? '');

  const plans: Plan[] = [
    { ...DEFAULTS.fabricA, ...options.networks?.a },
    { ...DEFAULTS.fabricB, ...options.networks?.b },
  ];
  const netIds = ['net-fabric-a', 'net-fabric-b'];
  plans.forEach((plan, i) => b.network({ id: netIds[i], purpose: 'data', ...plan }));
  if (withManagement) b.network({ id: 'net-management', purpose: 'management', ...DEFAULTS.management, ...options.management });

  const mgmtPort: PortSpec = { name: 'mgmt', role: 'management', speedGbps: 1, connector: 'rj45', networkId: withManagement ? 'net-management' : undefined };
  const controllers = Array.from({ length: controllerCount }, (_, c) => {
    const specs: PortSpec[] = Array.from({ length: controllerPorts }, (_, p) => ({ name: `p${p + 1}`, role: 'data', speedGbps, connector, networkId: netIds[p % 2] }));
    if (withManagement) specs.push(mgmtPort);
    return b.group(arrayId, controllerName(c), specs);
  });
  b.array(arrayId, controllers, PatternBuilder.targetName(options.iqnPrefix, arrayId));

  const layout = storagePorts(cards, perCard);
  const perFabric = [0, 1].map((f) => controllerCount * Math.ceil((controllerPorts - f) / 2) + names.length * layout.filter((s) => s.fabric === f).length);
  b.switch(swA, 'data', switchSize(perFabric[0]), speedGbps, connector);
  b.switch(swB, 'data', switchSize(perFabric[1]), speedGbps, connector);
  if (withManagement) b.switch(oob, 'management', switchSize(controllerCount + names.length), 1, 'rj45');

  names.forEach((host, h) => {
    const adapters = Array.from({ length: cards }, (_, c) =>
      b.group(host, `card-${c + 1}`, Array.from({ length: perCard }, (_, p) => {
        const storage = layout.find((s) => s.card === c && s.port === p);
        return { name: `p${p + 1}`, role: 'data' as const, speedGbps, connector, networkId: storage ? netIds[storage.fabric] : undefined };
      })),
    );
    if (withManagement) adapters.push(b.group(host, 'onboard', [mgmtPort]));
    b.host(host, adapters, options.iqnPrefix ? `${options.iqnPrefix}:${host}` : undefined);
  });

  const groups = ['a', 'b'];
  const switches = [swA, swB];
  for (const controller of controllers) {
    controller.ports.forEach((port, p) => {
      if (port.role === 'data') b.cable(groups[p % 2], port.id, b.switchPort(switches[p % 2]), media, 3);
    });
  }
  names.forEach((host, h) => {
    for (const s of layout) b.cable(groups[s.fabric], `${host}.card-${s.card + 1}.p${s.port + 1}`, b.switchPort(switches[s.fabric]), media, lengthOf(h));
  });
  if (withManagement) {
    for (const controller of controllers) b.cable('m', `${controller.id}.mgmt`, b.switchPort(oob), 'cat6', 3);
    names.forEach((host, h) => b.cable('m', `${host}.onboard.mgmt`, b.switchPort(oob), 'cat6', lengthOf(h)));
  }

  b.arrange([names, withManagement ? [swA, swB, oob] : [swA, swB], [arrayId]]);

  if (options.assignAddresses ?? true) b.assignAddresses();
  if (options.chap) b.doc.security = { chap: options.chap };
  return b.doc;
}
