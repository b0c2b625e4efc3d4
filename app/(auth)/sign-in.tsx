import { SignInScreen } from '@/components/auth/SignInScreen';

export default function SignInRoute() {
  return <SignInScreen />;
}
