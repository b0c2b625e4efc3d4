import { MailboxScreen } from '@/components/mailbox/MailboxScreen';
import { RequireCapability } from '@/components/shell/RequireCapability';

export default function MailboxRoute() {
  return (
    <RequireCapability capability="manageTeam" screen="Mailbox">
      <MailboxScreen />
    </RequireCapability>
  );
}
