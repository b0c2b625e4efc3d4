import { PatternBuilder, type PortSpec } from '@/shared/patterns/builder';
import { controllerName, dataMedia, DEFAULTS, hostNames, type PatternOptions } from '@/shared/patterns/options';
import type { Topology } from '@/shared/topology/schema';

/**
 * Direct attach: no switches. Each host's storage ports go straight to the controllers in turn
 * (card 1 to ctl-a, card 2 to ctl-b, …, and with more controllers than cards, port 2 of card 1 to
 * the next one), so every host reaches every controller over a cable of its own and, with two
 * cards or more, loses no controller to one card. A host with fewer storage ports than there are
 * controllers reaches only as many controllers as it has ports. Controllers get one port per host.
 *
 * Every cable is a point-to-point link with a subnet of its own (common practice: a controller
 * with two links on one subnet cannot tell which port answers for which address). The links take
 * /30 blocks of the RFC 5737 documentation ranges, 192 of them, then /64s of 2001:db8::/32 (RFC 3849).
 */
const IPV4_BASES = ['198.51.100', '203.0.113', '192.0.2'];
const PER_BLOCK = 64;

/** The subnet of the k-th link (0-based). */
export function directLinkCidr(k: number): string {
  if (k < IPV4_BASES.length * PER_BLOCK) return `${IPV4_BASES[Math.floor(k / PER_BLOCK)]}.${(k % PER_BLOCK) * 4}/30`;
  return `2001:db8:0:${(k - IPV4_BASES.length * PER_BLOCK + 1).toString(16)}::/64`;
}

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

  // Host storage ports, controller by controller: card 1, card 2, … while cards last, then the next
  // port of each card in turn, so no card carries two controllers while another card sits idle.
  const links = Array.from({ length: controllerCount }, (_, c) => ({ card: c % cards, port: Math.floor(c / cards) })).filter(
    (s) => s.port < perCard,
  );
  // One network per (host, linked controller), in host order: link k of the design gets subnet k.
  const netId = (h: number, c: number) => `net-${names[h]}-${controllerName(c)}`;
  names.forEach((host, h) =>
    links.forEach((_, c) => b.network({ id: netId(h, c), name: `${host} ${controllerName(c)}`, purpose: 'data', cidr: directLinkCidr(h * links.length + c), mtu: 9000 })),
  );

  const controllers = Array.from({ length: controllerCount }, (_, c) =>
    b.group(arrayId, controllerName(c), names.map((_, h): PortSpec => ({ name: `p${h + 1}`, role: 'data', speedGbps, connector, networkId: c < links.length ? netId(h, c) : undefined }))),
  );
  b.array(arrayId, controllers, PatternBuilder.targetName(options.iqnPrefix, arrayId));

  names.forEach((host, h) => {
    const adapters = Array.from({ length: cards }, (_, c) =>
      b.group(host, `card-${c + 1}`, Array.from({ length: perCard }, (_, p): PortSpec => {
        const link = links.findIndex((s) => s.card === c && s.port === p);
        return { name: `p${p + 1}`, role: 'data', speedGbps, connector, networkId: link >= 0 ? netId(h, link) : undefined };
      })),
    );
    b.host(host, adapters, options.iqnPrefix ? `${options.iqnPrefix}:${host}` : undefined);
    links.forEach((s, c) => b.cable('d', `${host}.card-${s.card + 1}.p${s.port + 1}`, `${controllers[c].id}.p${h + 1}`, media, lengthOf(h)));
  });
  b.arrange([names, [arrayId]]);

  if (options.assignAddresses ?? true) b.assignAddresses();
  if (options.chap) b.doc.security = { chap: options.chap };
  return b.doc;
}
