import type {
  Adapter,
  ArrayDevice,
  Cable,
  Controller,
  Device,
  HostDevice,
  Network,
  Port,
  SwitchDevice,
  Topology,
} from '@/shared/topology/schema';

/**
 * Lookups over one topology document, shared by the analysis, the canvas and the cable schedule.
 * Everything is in document order, so whatever iterates these gets a stable order for free.
 */
export type PortRef = {
  port: Port;
  device: Device;
  /** Set for array ports: the controller that holds the port. */
  controller?: Controller;
  /** Set for host ports: the card (or onboard group) that holds the port. */
  adapter?: Adapter;
  /** Where the port sits: device index, controller or card index (-1 on a switch), port index. */
  deviceIndex: number;
  groupIndex: number;
  portIndex: number;
};

/** Dotted path of the port inside the document, e.g. `devices.3.adapters.0.ports.1`. */
export function portPath(ref: PortRef): string {
  const { deviceIndex: d, groupIndex: g, portIndex: p } = ref;
  if (ref.device.kind === 'array') return `devices.${d}.controllers.${g}.ports.${p}`;
  if (ref.device.kind === 'host') return `devices.${d}.adapters.${g}.ports.${p}`;
  return `devices.${d}.ports.${p}`;
}

export type TopologyIndex = {
  devices: Map<string, Device>;
  ports: Map<string, PortRef>;
  cables: Map<string, Cable>;
  /** Cables by port id; a port cabled twice has two entries (a finding, not a schema error). */
  cablesByPort: Map<string, Cable[]>;
  networks: Map<string, Network>;
  controllers: Map<string, { controller: Controller; array: ArrayDevice }>;
  adapters: Map<string, { adapter: Adapter; host: HostDevice }>;
};

/** Every port of the document with its owners, in document order. */
export function* iteratePorts(doc: Topology): Generator<PortRef> {
  for (let d = 0; d < doc.devices.length; d += 1) {
    const device = doc.devices[d];
    if (device.kind === 'array') {
      for (let c = 0; c < device.controllers.length; c += 1) {
        const controller = device.controllers[c];
        for (let p = 0; p < controller.ports.length; p += 1) {
          yield { port: controller.ports[p], device, controller, deviceIndex: d, groupIndex: c, portIndex: p };
        }
      }
    } else if (device.kind === 'host') {
      for (let a = 0; a < device.adapters.length; a += 1) {
        const adapter = device.adapters[a];
        for (let p = 0; p < adapter.ports.length; p += 1) {
          yield { port: adapter.ports[p], device, adapter, deviceIndex: d, groupIndex: a, portIndex: p };
        }
      }
    } else {
      for (let p = 0; p < device.ports.length; p += 1) {
        yield { port: device.ports[p], device, deviceIndex: d, groupIndex: -1, portIndex: p };
      }
    }
  }
}

function portRef(port: Port, device: Device, controller: Controller | undefined, adapter: Adapter | undefined, d: number, g: number, p: number): PortRef {
  // Every ref gets the same fields in the same order: one object shape for the engine, however
  // many ports a design has.
  return { port, device, controller, adapter, deviceIndex: d, groupIndex: g, portIndex: p };
}

function addCableEnd(index: TopologyIndex, portId: string, cable: Cable): void {
  const list = index.cablesByPort.get(portId);
  if (list) list.push(cable);
  else index.cablesByPort.set(portId, [cable]);
}

export function indexTopology(doc: Topology): TopologyIndex {
  const index: TopologyIndex = {
    devices: new Map(),
    ports: new Map(),
    cables: new Map(),
    cablesByPort: new Map(),
    networks: new Map(),
    controllers: new Map(),
    adapters: new Map(),
  };
  // Plain loops rather than iteratePorts: this runs on every analysis of every edit.
  const { devices, ports } = index;
  for (let d = 0; d < doc.devices.length; d += 1) {
    const device = doc.devices[d];
    devices.set(device.id, device);
    if (device.kind === 'switch') {
      for (let p = 0; p < device.ports.length; p += 1) ports.set(device.ports[p].id, portRef(device.ports[p], device, undefined, undefined, d, -1, p));
    } else if (device.kind === 'array') {
      for (let c = 0; c < device.controllers.length; c += 1) {
        const controller = device.controllers[c];
        index.controllers.set(controller.id, { controller, array: device });
        for (let p = 0; p < controller.ports.length; p += 1) ports.set(controller.ports[p].id, portRef(controller.ports[p], device, controller, undefined, d, c, p));
      }
    } else {
      for (let a = 0; a < device.adapters.length; a += 1) {
        const adapter = device.adapters[a];
        index.adapters.set(adapter.id, { adapter, host: device });
        for (let p = 0; p < adapter.ports.length; p += 1) ports.set(adapter.ports[p].id, portRef(adapter.ports[p], device, undefined, adapter, d, a, p));
      }
    }
  }
  for (const network of doc.networks) index.networks.set(network.id, network);
  for (const cable of doc.cables) {
    index.cables.set(cable.id, cable);
    addCableEnd(index, cable.a, cable);
    addCableEnd(index, cable.b, cable);
  }
  return index;
}

/** The device that holds a port, or undefined for an unknown port id. */
export function portOwner(index: TopologyIndex, portId: string): Device | undefined {
  return index.ports.get(portId)?.device;
}

/** The failure unit a port dies with: its card, its controller, or its switch. */
export function portUnitId(ref: PortRef): string {
  return ref.adapter?.id ?? ref.controller?.id ?? ref.device.id;
}

/** The port at the other end of a cable, seen from one end. */
export function otherEnd(cable: Cable, portId: string): string {
  return cable.a === portId ? cable.b : cable.a;
}

/** A thing's name for messages, falling back to its id when a draft left the name empty. */
export function displayName(thing: { id: string; name?: string }): string {
  const name = thing.name?.trim();
  return name ? name : thing.id;
}

/** "wms-db-1 card 1 port 1": a port named by its owners, as an installer reads it. */
export function portLabel(ref: PortRef): string {
  const group = ref.adapter ?? ref.controller;
  const parts = [displayName(ref.device)];
  if (group) parts.push(displayName(group));
  parts.push(displayName(ref.port));
  return parts.join(' ');
}

export function isArray(device: Device): device is ArrayDevice {
  return device.kind === 'array';
}

export function isSwitch(device: Device): device is SwitchDevice {
  return device.kind === 'switch';
}

export function isHost(device: Device): device is HostDevice {
  return device.kind === 'host';
}
