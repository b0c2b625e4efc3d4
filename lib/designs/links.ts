import type { Href } from 'expo-router';

export const newDesignHref: Href = '/designs/new';

export function designHref(id: number, version?: number): Href {
  return version === undefined
    ? { pathname: '/designs/[id]', params: { id } }
    : { pathname: '/designs/[id]', params: { id, version } };
}

export function versionHref(id: number, n: number): Href {
  return { pathname: '/designs/[id]/versions/[n]', params: { id, n } };
}

export function reportHref(id: number, n: number): Href {
  return { pathname: '/designs/[id]/versions/[n]/report', params: { id, n } };
}

export function diffHref(id: number, from: number, to: number): Href {
  return { pathname: '/designs/[id]/diff', params: { id, from, to } };
}

/** The canvas (editable or read-only by role). Typed loosely: generated route types may lag behind the route. */
export function editorHref(id: number): Href {
  return `/designs/${id}/edit` as Href;
}

/** A route parameter as a positive whole number, or null for anything else ("abc", "-1", "2.5", arrays). */
export function positiveInt(value: string | string[] | undefined): number | null {
  if (typeof value !== 'string' || !/^[1-9][0-9]{0,8}$/.test(value)) return null;
  return Number(value);
}

/** The cable schedule of a version. Typed loosely like the editor's: generated route types may lag behind. */
export function scheduleHref(id: number, n: number): Href {
  return `/designs/${id}/versions/${n}/cables` as Href;
}

/** One cable's detail; the id is user text, so it is percent-encoded (RFC 3986 §2.1). */
export function cableHref(id: number, n: number, cableId: string): Href {
  return `/designs/${id}/versions/${n}/cables/${encodeURIComponent(cableId)}` as Href;
}

/** The printable label sheet of a version. */
export function labelSheetHref(id: number, n: number): Href {
  return `/designs/${id}/versions/${n}/labels` as Href;
}
