/** Create an account (which also creates the user's own team, as its owner). */
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'expo-router';
import { View } from 'react-native';
import { signUp } from '@/lib/api/auth';
import { ME_QUERY_KEY } from '@/lib/api/me';
import { PASSWORD_MIN_LENGTH, signUpBodySchema } from '@/lib/schema/api-auth';
import { AuthLayout } from '@/components/auth/auth-layout';
import { AuthLink, AuthNote } from '@/components/auth/auth-link';
import { safeNext } from '@/components/auth/safe-next';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { fieldErrorsFromApi, messageOf, validate } from '@/components/ui/form-errors';
import { Stack } from '@/components/ui/screen';
import { TextField } from '@/components/ui/text-field';
import { useFormFields } from '@/components/ui/use-form-fields';

export function SignUpScreen({ next }: { next?: string }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const form = useFormFields({ name: '', email: '', password: '' });
  const { setErrors } = form;
  const mutation = useMutation({
    mutationFn: signUp,
    onSuccess: async () => {
      queryClient.removeQueries();
      await queryClient.invalidateQueries({ queryKey: ME_QUERY_KEY });
      router.replace(safeNext(next));
    },
    onError: (err) => setErrors(fieldErrorsFromApi(err)),
  });

  const submit = () => {
    const r = validate(signUpBodySchema, form.values);
    setErrors(r.errors ?? {});
    if (r.data) mutation.mutate(r.data);
  };

  const formError = mutation.error && Object.keys(fieldErrorsFromApi(mutation.error)).length === 0 ? messageOf(mutation.error) : null;
  const nextQuery = next ? `?next=${encodeURIComponent(next)}` : '';

  return (
    <AuthLayout title="Create your account" subtitle="You get your own team; invite colleagues when you are ready.">
      <View role="group" accessibilityLabel="Create your account">
        <Stack>
          {formError ? (
            <Banner tone="error" title="Could not create the account" testID="sign-up-error">
              {formError}
            </Banner>
          ) : null}
          <TextField
            label="Your name"
            {...form.field('name')}
            autoComplete="name"
            testID="sign-up-name"
          />
          <TextField
            label="E-mail"
            {...form.field('email')}
            autoComplete="email"
            inputMode="email"
            autoCapitalize="none"
            testID="sign-up-email"
          />
          <TextField
            label="Password"
            {...form.field('password')}
            hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
            secureTextEntry
            autoComplete="new-password"
            testID="sign-up-password"
            onSubmitEditing={submit}
          />
          <Button label="Create account" onPress={submit} loading={mutation.isPending} fullWidth testID="sign-up-submit" />
          <AuthNote>
            Already have an account? <AuthLink href={`/sign-in${nextQuery}`}>Sign in</AuthLink>
          </AuthNote>
        </Stack>
      </View>
    </AuthLayout>
  );
}
