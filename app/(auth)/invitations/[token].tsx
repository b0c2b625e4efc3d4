import { useLocalSearchParams } from 'expo-router';
import { AcceptInvitationScreen } from '@/components/auth/AcceptInvitationScreen';

export default function InvitationRoute() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return <AcceptInvitationScreen token={token} />;
}
