import type { ReactNode } from 'react';
import { Shell } from '@/components/shell/Shell';
import { useTeam } from '@/lib/api/team';
import type { User } from '@/shared/api/auth';

/** The shell with the team's name filled in; the name arrives after the user, so it may be blank briefly. */
export function SignedInShell({ user, children }: { user: User; children: ReactNode }) {
  const team = useTeam();
  return (
    <Shell user={user} teamName={team.data?.team.name ?? null}>
      {children}
    </Shell>
  );
}
