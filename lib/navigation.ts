import type { Href } from 'expo-router';
import { can, type Capability, type Role } from '@/shared/roles';

export type NavKey = 'designs' | 'site' | 'team' | 'mailbox' | 'account';

export type NavItem = { key: NavKey; label: string; href: Href; icon: NavKey; capability?: Capability };

/** The signed-in destinations, in the order the tab bar and the sidebar show them. */
export const NAV_ITEMS: readonly NavItem[] = [
  { key: 'designs', label: 'Designs', href: '/designs', icon: 'designs' },
  // The installer's home on site: the approved versions to build and their progress.
  { key: 'site', label: 'Site work', href: '/site', icon: 'site', capability: 'markBuild' },
  { key: 'team', label: 'Team', href: '/team', icon: 'team', capability: 'manageTeam' },
  { key: 'mailbox', label: 'Mailbox', href: '/mailbox', icon: 'mailbox', capability: 'manageTeam' },
  { key: 'account', label: 'Account', href: '/account', icon: 'account' },
];

/** Only what the role may use appears in navigation; the screens guard themselves as well. */
export function navItemsFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((item) => !item.capability || can(role, item.capability));
}

/** Which item a path belongs to: `/mailbox/abc` is still the Mailbox. */
export function activeNavKey(pathname: string): NavKey | null {
  const first = pathname.split('/').filter(Boolean)[0];
  return NAV_ITEMS.find((item) => item.key === first)?.key ?? null;
}

/** A `next` target after sign-in must stay inside the app (no `//host` or absolute URLs). */
export function safeNextPath(next: unknown): string | null {
  if (typeof next !== 'string' || !next.startsWith('/') || next.startsWith('//')) return null;
  if (next.startsWith('/sign-in')) return null;
  return next;
}
