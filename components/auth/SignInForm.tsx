import { useRef, useState } from 'react';
import type { TextInput } from 'react-native';
import { Banner, Button, Card, Heading, TextField } from '@/components/ui';
import { useSignIn } from '@/lib/api/auth';
import { describeFailure, validate, type FieldErrors } from '@/lib/forms';
import { signInBody } from '@/shared/api/auth';

/**
 * E-mail and password. Checked in the browser with the server's own schema first; the server's
 * answer (one sentence for a wrong e-mail or password, or too many attempts) shows above the button.
 * Navigation after success belongs to the auth layout, which sees the signed-in user.
 */
export function SignInForm() {
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [errors, setErrors] = useState<FieldErrors>({});
  const passwordRef = useRef<TextInput>(null);
  const signIn = useSignIn();
  const failure = describeFailure(signIn.error);

  function submit() {
    const checked = validate(signInBody, { email, password });
    setErrors(checked.errors ?? {});
    if (!checked.data) return;
    signIn.mutate(checked.data);
  }

  const fieldErrors = { ...failure.fields, ...errors };
  return (
    <Card>
      <Heading level={1}>Sign in</Heading>
      <TextField
        label="E-mail"
        testID="sign-in-email"
        value={email}
        onChangeText={setEmail}
        error={fieldErrors.email}
        autoCapitalize="none"
        autoComplete="email"
        inputMode="email"
        returnKeyType="next"
        onSubmitEditing={() => passwordRef.current?.focus()}
      />
      <TextField
        ref={passwordRef}
        label="Password"
        testID="sign-in-password"
        value={password}
        onChangeText={setPassword}
        error={fieldErrors.password}
        secureTextEntry
        autoComplete="current-password"
        returnKeyType="go"
        onSubmitEditing={submit}
      />
      {failure.form ? (
        <Banner tone="error" title="Not signed in" testID="sign-in-error">
          {failure.form}
        </Banner>
      ) : null}
      <Button label="Sign in" loadingLabel="Signing in…" loading={signIn.isPending} onPress={submit} testID="sign-in-submit" fullWidth />
    </Card>
  );
}
