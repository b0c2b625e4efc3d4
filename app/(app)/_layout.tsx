import { Slot, usePathname } from 'expo-router';
import { RouteFrame } from '@/components/shell/RouteFrame';
import { SessionProblem } from '@/components/shell/SessionStates';
import { SignedInShell } from '@/components/shell/SignedInShell';
import { QueueSender } from '@/components/build/QueueSender';
import { useMe } from '@/lib/api/auth';
import { SessionPendingContext } from '@/lib/api/session-gate';

/** Signed-in screens: signed-out visitors go to sign-in and come back here afterwards. */
export default function AppLayout() {
  const me = useMe();
  const pathname = usePathname();
  if (me.isError) return <SessionProblem message={me.error.message} onRetry={() => void me.refetch()} />;
  if (me.data) {
    return (
      <SignedInShell user={me.data}>
        <QueueSender />
        <Slot />
      </SignedInShell>
    );
  }
  return (
    <RouteFrame loading hidden redirect={me.data === null ? { pathname: '/sign-in', params: { next: pathname } } : null}>
      <SessionPendingContext.Provider value>
        <Slot />
      </SessionPendingContext.Provider>
    </RouteFrame>
  );
}
