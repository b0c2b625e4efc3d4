import { AuthFrame } from '@/components/auth/AuthFrame';
import { SignInForm } from '@/components/auth/SignInForm';
import { Text } from '@/components/ui';

export function SignInScreen() {
  return (
    <AuthFrame>
      <SignInForm />
      <Text variant="small" color="inkMuted">
        New to your team? Open the invitation link your admin sent you to set up your account.
      </Text>
    </AuthFrame>
  );
}
