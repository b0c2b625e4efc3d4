import type { ReactNode } from 'react';
import { Link } from 'expo-router';
import { Button, EmptyState, Screen } from '@/components/ui';
import { SessionLoading } from '@/components/shell/SessionStates';
import { useMe } from '@/lib/api/auth';
import { roleLabel } from '@/lib/format';
import { can } from '@/shared/roles';

/** Screens that change designs, for designers and admins only (docs/api.md); the server refuses the rest too. */
export function EditorsOnly({ screen, children }: { screen: string; children: ReactNode }) {
  const me = useMe();
  if (!me.data) return <SessionLoading />;
  if (can(me.data.role, 'editDesigns')) return <>{children}</>;
  return (
    <Screen testID="not-available">
      <EmptyState icon="lock" title={`${screen} is not available for your role`}>
        {`You are signed in as a ${roleLabel(me.data.role).toLowerCase()}. Designers and admins start and change designs.`}
      </EmptyState>
      <Link href="/designs" asChild>
        <Button label="Go to Designs" variant="secondary" />
      </Link>
    </Screen>
  );
}
