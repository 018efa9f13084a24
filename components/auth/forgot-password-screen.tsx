/** Ask for a password-reset link by e-mail. The server answers the same whether or not the address has an account. */
import { useMutation } from '@tanstack/react-query';
import { View } from 'react-native';
import { requestPasswordReset } from '@/lib/api/auth';
import { forgotPasswordBodySchema } from '@/lib/schema/api-auth';
import { AuthLayout } from '@/components/auth/auth-layout';
import { AuthLink, AuthNote } from '@/components/auth/auth-link';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { fieldErrorsFromApi, messageOf, validate } from '@/components/ui/form-errors';
import { Stack } from '@/components/ui/screen';
import { TextField } from '@/components/ui/text-field';
import { useFormFields } from '@/components/ui/use-form-fields';

export function ForgotPasswordScreen() {
  const form = useFormFields({ email: '' });
  const { values, errors, setErrors } = form;
  const mutation = useMutation({ mutationFn: requestPasswordReset, onError: (err) => setErrors(fieldErrorsFromApi(err)) });

  const submit = () => {
    const r = validate(forgotPasswordBodySchema, values);
    setErrors(r.errors ?? {});
    if (r.data) mutation.mutate(r.data);
  };

  return (
    <AuthLayout title="Reset your password" subtitle="We e-mail you a link to choose a new password. The link works once.">
      <View role="group" accessibilityLabel="Reset your password">
        <Stack>
          {mutation.isSuccess ? (
            <Banner tone="success" title="Check your e-mail" testID="forgot-sent">
              {`If ${values.email.trim()} has a Tubeloom account, a reset link is on its way. It expires in one hour.`}
            </Banner>
          ) : null}
          {mutation.error && !errors.email ? (
            <Banner tone="error" title="Could not send the link">
              {messageOf(mutation.error)}
            </Banner>
          ) : null}
          <TextField
            label="E-mail"
            {...form.field('email')}
            autoComplete="email"
            inputMode="email"
            autoCapitalize="none"
            testID="forgot-email"
            onSubmitEditing={submit}
          />
          <Button label="Send reset link" onPress={submit} loading={mutation.isPending} fullWidth testID="forgot-submit" />
          <AuthNote>
            Remembered it? <AuthLink href="/sign-in">Sign in</AuthLink>
          </AuthNote>
        </Stack>
      </View>
    </AuthLayout>
  );
}
