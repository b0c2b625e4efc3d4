import { Redirect, Slot, useGlobalSearchParams, useSegments } from 'expo-router';
import type { Href } from 'expo-router';
import { SessionLoading } from '@/components/shell/SessionStates';
import { useMe } from '@/lib/api/auth';
import { safeNextPath } from '@/lib/navigation';

/**
 * Signed-out screens. Someone already signed in who opens sign-in goes on to Designs (or the page
 * they were sent from); an invitation link still opens while signed in, so an admin can follow one.
 */
export default function AuthLayout() {
  const me = useMe();
  const segments = useSegments() as string[];
  const { next } = useGlobalSearchParams<{ next?: string }>();
  const onSignIn = segments[segments.length - 1] === 'sign-in';
  if (onSignIn && me.isPending) return <SessionLoading />;
  if (onSignIn && me.data) return <Redirect href={(safeNextPath(next) ?? '/designs') as Href} />;
  return <Slot />;
}
