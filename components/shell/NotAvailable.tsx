import { Link } from 'expo-router';
import { Button, EmptyState, Screen } from '@/components/ui';
import { roleLabel } from '@/lib/format';
import { CAPABILITIES, type Capability, type Role } from '@/shared/roles';

/** "installers and team admins": the roles that may use a capability, in words. */
export function rolesInWords(capability: Capability): string {
  const names = (CAPABILITIES[capability] as readonly Role[]).map((r) => (r === 'admin' ? 'team admins' : `${roleLabel(r).toLowerCase()}s`));
  const ordered = [...names.filter((n) => n !== 'team admins'), ...names.filter((n) => n === 'team admins')];
  return ordered.length <= 1 ? (ordered[0] ?? '') : `${ordered.slice(0, -1).join(', ')} and ${ordered.at(-1)}`;
}

/** What someone sees when they open a screen their role may not use (a typed URL, an old bookmark). */
export function NotAvailable({ screen, role, capability }: { screen: string; role: Role; capability: Capability }) {
  return (
    <Screen testID="not-available">
      <EmptyState icon="lock" title={`${screen} is not available for your role`}>
        {`You are signed in as a ${roleLabel(role).toLowerCase()}. ${screen} is for ${rolesInWords(capability)}; ask an admin of your team if you need something changed.`}
      </EmptyState>
      <Link href="/designs" asChild>
        <Button label="Go to Designs" variant="secondary" />
      </Link>
    </Screen>
  );
}
