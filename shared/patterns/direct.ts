import { PatternBuilder, type PortSpec } from '@/shared/patterns/builder';
import { controllerName, dataMedia, DEFAULTS, hostNames, type PatternOptions } from '@/shared/patterns/options';
import type { Topology } from '@/shared/topology/schema';

/**
 * Direct attach: no switches. Each host's storage ports go straight to the controllers in turn
 * (card 1 to ctl-a, card 2 to ctl-b, …, and with more controllers than cards, port 2 of card 1 to
 * the next one), each controller on a subnet of its own, so every host reaches every controller
 * over a cable of its own and, with two cards or more, loses no controller to one card. A host
 * with fewer storage ports than there are controllers reaches only as many controllers as it has
 * ports. Controllers get one port per host.
 */
export function directAttach(options: PatternOptions = {}): Topology {
  const names = hostNames(options.hosts);
  const cards = Math.max(1, options.cardsPerHost ?? DEFAULTS.cardsPerHost);
  const perCard = Math.max(1, options.portsPerCard ?? DEFAULTS.portsPerCard);
  const speedGbps = options.speedGbps ?? DEFAULTS.speedGbps;
  const connector = options.connector ?? DEFAULTS.connector;
  const media = dataMedia(options);
  const arrayId = options.arrayName ?? DEFAULTS.arrayName;
  const controllerCount = Math.min(4, Math.max(1, options.controllers ?? DEFAULTS.controllers));
  const lengthOf = options.hostCableLengthM ?? (() => 3);
  const b = new PatternBuilder(options.name ?? 'Direct attach', options.labelPrefix ?? '');

  // RFC 5737 documentation ranges, one /24 per controller side.
  const ranges = ['198.51.100.0/24', '203.0.113.0/24', '192.0.2.0/25', '192.0.2.128/25'];
  const netIds = Array.from({ length: controllerCount }, (_, c) => `net-${controllerName(c)}`);
  netIds.forEach((id, c) => b.network({ id, name: `direct ${controllerName(c)}`, purpose: 'data', cidr: ranges[c], mtu: 9000 }));

  // Host storage ports, controller by controller: card 1, card 2, … while cards last, then the next
  // port of each card in turn, so no card carries two controllers while another card sits idle.
  const links = Array.from({ length: controllerCount }, (_, c) => ({ card: c % cards, port: Math.floor(c / cards) })).filter(
    (s) => s.port < perCard,
  );
  const perController = names.length;

  const controllers = Array.from({ length: controllerCount }, (_, c) =>
    b.group(arrayId, controllerName(c), Array.from({ length: perController }, (_, p): PortSpec => ({ name: `p${p + 1}`, role: 'data', speedGbps, connector, networkId: netIds[c] }))),
  );
  b.array(arrayId, controllers);

  const used = controllers.map(() => 0);
  names.forEach((host, h) => {
    const adapters = Array.from({ length: cards }, (_, c) =>
      b.group(host, `card-${c + 1}`, Array.from({ length: perCard }, (_, p): PortSpec => {
        const link = links.findIndex((s) => s.card === c && s.port === p);
        return { name: `p${p + 1}`, role: 'data', speedGbps, connector, networkId: link >= 0 ? netIds[link % controllerCount] : undefined };
      })),
    );
    b.host(host, adapters, options.iqnPrefix ? `${options.iqnPrefix}:${host}` : undefined);
    links.forEach((s, i) => {
      const c = i % controllerCount;
      used[c] += 1;
      b.cable('d', `${host}.card-${s.card + 1}.p${s.port + 1}`, `${controllers[c].id}.p${used[c]}`, media, lengthOf(h));
    });
  });
  b.arrange([names, [arrayId]]);

  if (options.assignAddresses ?? true) b.assignAddresses();
  if (options.chap) b.doc.security = { chap: options.chap };
  return b.doc;
}
