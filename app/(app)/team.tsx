import { RequireCapability } from '@/components/shell/RequireCapability';
import { TeamScreen } from '@/components/team/TeamScreen';

export default function TeamRoute() {
  return (
    <RequireCapability capability="manageTeam" screen="Team">
      <TeamScreen />
    </RequireCapability>
  );
}
