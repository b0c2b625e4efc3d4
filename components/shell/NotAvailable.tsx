import { Link } from 'expo-router';
import { Button, EmptyState, Screen } from '@/components/ui';
import { roleLabel } from '@/lib/format';
import type { Role } from '@/shared/roles';

/** What someone sees when they open a screen their role may not use (a typed URL, an old bookmark). */
export function NotAvailable({ screen, role }: { screen: string; role: Role }) {
  return (
    <Screen testID="not-available">
      <EmptyState icon="lock" title={`${screen} is not available for your role`}>
        {`You are signed in as a ${roleLabel(role).toLowerCase()}. ${screen} is for team admins; ask an admin of your team if you need something changed.`}
      </EmptyState>
      <Link href="/designs" asChild>
        <Button label="Go to Designs" variant="secondary" />
      </Link>
    </Screen>
  );
}
