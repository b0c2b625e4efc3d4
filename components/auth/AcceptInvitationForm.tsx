import { useState } from 'react';
import { useRouter } from 'expo-router';
import { Banner, Button, TextField } from '@/components/ui';
import { useAcceptInvitation } from '@/lib/api/team';
import { describeFailure, validate, type FieldErrors } from '@/lib/forms';
import { acceptInvitationBody } from '@/shared/api/team';

/** Name and a new password; on success the browser is signed in as the new member and lands on Designs. */
export function AcceptInvitationForm({ token }: { token: string }) {
  const [name, setName] = useState('');
  const [password, setPassword] = useState('');
  const [errors, setErrors] = useState<FieldErrors>({});
  const accept = useAcceptInvitation(token);
  const router = useRouter();
  const failure = describeFailure(accept.error);

  function submit() {
    const checked = validate(acceptInvitationBody, { name, password });
    setErrors(checked.errors ?? {});
    if (!checked.data) return;
    accept.mutate(checked.data, { onSuccess: () => router.replace('/designs') });
  }

  const fieldErrors = { ...failure.fields, ...errors };
  return (
    <>
      <TextField
        label="Your name"
        hint="As your team will see it, e.g. on versions you save and reviews you sign."
        testID="accept-name"
        value={name}
        onChangeText={setName}
        error={fieldErrors.name}
        autoComplete="name"
      />
      <TextField
        label="New password"
        hint="At least 12 characters. A few unrelated words make a strong, memorable one."
        testID="accept-password"
        value={password}
        onChangeText={setPassword}
        error={fieldErrors.password}
        secureTextEntry
        autoComplete="new-password"
        onSubmitEditing={submit}
      />
      {failure.form ? (
        <Banner tone="error" title="Account not created" testID="accept-error">
          {failure.form}
        </Banner>
      ) : null}
      <Button label="Join the team" loadingLabel="Setting up your account…" loading={accept.isPending} onPress={submit} testID="accept-submit" fullWidth />
    </>
  );
}
