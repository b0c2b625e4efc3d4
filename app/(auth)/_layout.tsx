import { Redirect, Slot, useGlobalSearchParams, usePathname } from 'expo-router';
import type { Href } from 'expo-router';
import { RouteFrame } from '@/components/shell/RouteFrame';
import { useMe } from '@/lib/api/auth';
import { safeNextPath } from '@/lib/navigation';

/**
 * Signed-out screens. Someone already signed in who opens sign-in goes on to Designs (or the page
 * they were sent from); an invitation link still opens while signed in, so an admin can follow one.
 */
export default function AuthLayout() {
  const me = useMe();
  const onSignIn = usePathname() === '/sign-in';
  const { next } = useGlobalSearchParams<{ next?: string }>();
  const redirect = onSignIn && me.data ? ((safeNextPath(next) ?? '/designs') as Href) : null;
  return (
    <RouteFrame loading={onSignIn && me.isPending} redirect={redirect}>
      <Slot />
    </RouteFrame>
  );
}
