import { Link } from 'expo-router';
import { Button, EmptyState } from '@/components/ui';
import { newDesignHref } from '@/lib/designs/links';
import { can, type Role } from '@/shared/roles';

type DesignsEmptyProps = { role: Role | undefined; search: string | null; teamName: string };

/** Nothing to list: for a search, say what was searched; otherwise what will appear here and who starts it. */
export function DesignsEmpty({ role, search, teamName }: DesignsEmptyProps) {
  if (search) {
    return (
      <EmptyState icon="search" title="No design matches" testID="designs-no-match">
        {`No design of ${teamName} has “${search}” in its name or site.`}
      </EmptyState>
    );
  }
  if (role === 'installer') {
    return (
      <EmptyState icon="designs" title="Nothing approved to build yet" testID="designs-empty">
        {'Designs appear here once a reviewer has approved a version of them. Until then there is nothing to install.'}
      </EmptyState>
    );
  }
  const editor = role ? can(role, 'editDesigns') : false;
  return (
    <EmptyState
      icon="designs"
      title="No designs yet"
      testID="designs-empty"
      action={
        editor ? (
          <Link href={newDesignHref} asChild>
            <Button label="Start the first design" testID="designs-empty-new" />
          </Link>
        ) : null
      }
    >
      {editor
        ? `Start ${teamName}'s first storage-network design: blank, from a pattern, or from a topology file.`
        : `${teamName} has no designs yet. Designers start them; versions sent for review appear here.`}
    </EmptyState>
  );
}
