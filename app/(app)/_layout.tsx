import { Redirect, Slot, usePathname } from 'expo-router';
import { SessionLoading, SessionProblem } from '@/components/shell/SessionStates';
import { SignedInShell } from '@/components/shell/SignedInShell';
import { useMe } from '@/lib/api/auth';

/** Signed-in screens: signed-out visitors go to sign-in and come back here afterwards. */
export default function AppLayout() {
  const me = useMe();
  const pathname = usePathname();
  if (me.isPending) return <SessionLoading />;
  if (me.isError) return <SessionProblem message={me.error.message} onRetry={() => void me.refetch()} />;
  if (!me.data) return <Redirect href={{ pathname: '/sign-in', params: { next: pathname } }} />;
  return (
    <SignedInShell user={me.data}>
      <Slot />
    </SignedInShell>
  );
}
