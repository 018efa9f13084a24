/** Sign in with e-mail and password; wrong credentials get the server's message above the form. */
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'expo-router';
import { View } from 'react-native';
import { signIn } from '@/lib/api/auth';
import { ME_QUERY_KEY } from '@/lib/api/me';
import { signInBodySchema } from '@/lib/schema/api-auth';
import { AuthLayout } from '@/components/auth/auth-layout';
import { AuthLink, AuthNote } from '@/components/auth/auth-link';
import { safeNext } from '@/components/auth/safe-next';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { fieldErrorsFromApi, messageOf, validate } from '@/components/ui/form-errors';
import { Stack } from '@/components/ui/screen';
import { TextField } from '@/components/ui/text-field';
import { useFormFields } from '@/components/ui/use-form-fields';

export function SignInScreen({ next }: { next?: string }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const form = useFormFields({ email: '', password: '' });
  const { setErrors } = form;
  const mutation = useMutation({
    mutationFn: signIn,
    onSuccess: async () => {
      queryClient.removeQueries();
      await queryClient.invalidateQueries({ queryKey: ME_QUERY_KEY });
      router.replace(safeNext(next));
    },
    onError: (err) => setErrors(fieldErrorsFromApi(err)),
  });

  const submit = () => {
    const r = validate(signInBodySchema, form.values);
    setErrors(r.errors ?? {});
    if (r.data) mutation.mutate(r.data);
  };

  const formError = mutation.error && Object.keys(fieldErrorsFromApi(mutation.error)).length === 0 ? messageOf(mutation.error) : null;
  const nextQuery = next ? `?next=${encodeURIComponent(next)}` : '';

  return (
    <AuthLayout title="Sign in" subtitle="Welcome back. Your projects and coils are where you left them.">
      <View role="group" accessibilityLabel="Sign in">
        <Stack>
          {formError ? (
            <Banner tone="error" title="Could not sign you in" testID="sign-in-error">
              {formError}
            </Banner>
          ) : null}
          <TextField
            label="E-mail"
            {...form.field('email')}
            autoComplete="email"
            inputMode="email"
            autoCapitalize="none"
            testID="sign-in-email"
            onSubmitEditing={submit}
          />
          <TextField
            label="Password"
            {...form.field('password')}
            secureTextEntry
            autoComplete="current-password"
            testID="sign-in-password"
            onSubmitEditing={submit}
          />
          <Button label="Sign in" onPress={submit} loading={mutation.isPending} fullWidth testID="sign-in-submit" />
          <AuthLink href="/forgot-password">Forgot your password?</AuthLink>
          <AuthNote>
            New to Tubeloom? <AuthLink href={`/sign-up${nextQuery}`}>Create an account</AuthLink>
          </AuthNote>
        </Stack>
      </View>
    </AuthLayout>
  );
}
