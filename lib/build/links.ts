import type { Href } from 'expo-router';

/**
 * Addresses of the site-work screens. Typed loosely like the editor's: the generated route types may
 * lag behind new routes. A cable's own page is `cableHref` in lib/designs/links.ts, the address its
 * label's QR code holds (shared/labels/content.ts).
 */
export const siteHomeHref: Href = '/site' as Href;

export function checklistHref(id: number, n: number): Href {
  return `/designs/${id}/versions/${n}/build` as Href;
}

export function cablesToDoHref(id: number, n: number, rackId?: string | null): Href {
  const base = `/designs/${id}/versions/${n}/build/cables`;
  return (rackId ? `${base}?rack=${encodeURIComponent(rackId)}` : base) as Href;
}
