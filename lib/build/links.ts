import type { Href } from 'expo-router';

/**
 * Addresses of the site-work screens. Typed loosely like the editor's: the generated route types may
 * lag behind new routes. A cable's own address is the one its label's QR code holds
 * (shared/labels/content.ts): `/designs/:id/versions/:n/cables/:cableId`, the id percent-encoded.
 */
export const siteHomeHref: Href = '/site' as Href;

export function checklistHref(id: number, n: number): Href {
  return `/designs/${id}/versions/${n}/build` as Href;
}

export function cablesToDoHref(id: number, n: number, rackId?: string | null): Href {
  const base = `/designs/${id}/versions/${n}/build/cables`;
  return (rackId ? `${base}?rack=${encodeURIComponent(rackId)}` : base) as Href;
}

export function cableHref(id: number, n: number, cableId: string): Href {
  return `/designs/${id}/versions/${n}/cables/${encodeURIComponent(cableId)}` as Href;
}
