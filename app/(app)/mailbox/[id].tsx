import { useLocalSearchParams } from 'expo-router';
import { MessageScreen } from '@/components/mailbox/MessageScreen';
import { RequireCapability } from '@/components/shell/RequireCapability';

export default function MessageRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return (
    <RequireCapability capability="manageTeam" screen="Mailbox">
      <MessageScreen id={id} />
    </RequireCapability>
  );
}
