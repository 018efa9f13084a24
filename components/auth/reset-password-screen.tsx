/** Choose a new password with the single-use token from the reset e-mail. */
import { useMutation } from '@tanstack/react-query';
import { useState } from 'react';
import { View } from 'react-native';
import { resetPassword } from '@/lib/api/auth';
import { PASSWORD_MIN_LENGTH, resetPasswordBodySchema } from '@/lib/schema/api-auth';
import { AuthLayout } from '@/components/auth/auth-layout';
import { AuthLink, AuthNote } from '@/components/auth/auth-link';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { fieldErrorsFromApi, messageOf, validate, type FieldErrors } from '@/components/ui/form-errors';
import { Stack } from '@/components/ui/screen';
import { TextField } from '@/components/ui/text-field';

export function ResetPasswordScreen({ token }: { token: string }) {
  const [password, setPassword] = useState('');
  const [confirm, setConfirm] = useState('');
  const [errors, setErrors] = useState<FieldErrors>({});
  const mutation = useMutation({ mutationFn: resetPassword, onError: (err) => setErrors(fieldErrorsFromApi(err)) });

  const submit = () => {
    const r = validate(resetPasswordBodySchema, { token, password });
    const next: FieldErrors = r.errors ?? {};
    if (!next.password && password !== confirm) next.confirm = 'The two passwords differ. Type the same one twice.';
    setErrors(next);
    if (r.data && !next.confirm) mutation.mutate(r.data);
  };

  if (!token) {
    return (
      <AuthLayout title="Choose a new password">
        <Banner tone="error" title="This link is incomplete">
          Open the link from the reset e-mail again, or ask for a new one.
        </Banner>
        <AuthLink href="/forgot-password">Ask for a new reset link</AuthLink>
      </AuthLayout>
    );
  }

  if (mutation.isSuccess) {
    return (
      <AuthLayout title="Password changed">
        <Banner tone="success" title="Your new password is set" testID="reset-done">
          Sign in with it now. Other sessions were signed out.
        </Banner>
        <AuthLink href="/sign-in">Go to sign in</AuthLink>
      </AuthLayout>
    );
  }

  const formError = mutation.error && Object.keys(fieldErrorsFromApi(mutation.error)).length === 0 ? messageOf(mutation.error) : null;

  return (
    <AuthLayout title="Choose a new password">
      <View role="group" accessibilityLabel="Choose a new password">
        <Stack>
          {formError || errors.token ? (
            <Banner tone="error" title="Could not change the password">
              {errors.token ?? formError ?? ''}
            </Banner>
          ) : null}
          <TextField
            label="New password"
            value={password}
            onChangeText={setPassword}
            error={errors.password}
            hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
            secureTextEntry
            autoComplete="new-password"
            testID="reset-password"
          />
          <TextField
            label="Repeat the new password"
            value={confirm}
            onChangeText={setConfirm}
            error={errors.confirm}
            secureTextEntry
            autoComplete="new-password"
            testID="reset-confirm"
            onSubmitEditing={submit}
          />
          <Button label="Set new password" onPress={submit} loading={mutation.isPending} fullWidth testID="reset-submit" />
          <AuthNote>
            Link expired? <AuthLink href="/forgot-password">Ask for a new one</AuthLink>
          </AuthNote>
        </Stack>
      </View>
    </AuthLayout>
  );
}
