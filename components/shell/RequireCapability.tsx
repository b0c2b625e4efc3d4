import type { ReactNode } from 'react';
import { NotAvailable } from '@/components/shell/NotAvailable';
import { SessionLoading } from '@/components/shell/SessionStates';
import { useMe } from '@/lib/api/auth';
import { can, type Capability } from '@/shared/roles';

/** Renders the screen only for roles with the capability; the server enforces the same rule. */
export function RequireCapability({ capability, screen, children }: { capability: Capability; screen: string; children: ReactNode }) {
  const me = useMe();
  if (!me.data) return <SessionLoading />;
  if (!can(me.data.role, capability)) return <NotAvailable screen={screen} role={me.data.role} capability={capability} />;
  return <>{children}</>;
}
