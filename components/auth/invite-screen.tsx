/**
 * Accept an invitation: shows the team and role first; a signed-in user accepts with one press, anyone else is
 * sent to sign in or sign up and brought back here.
 */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'expo-router';
import { ActivityIndicator, Text } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { ME_QUERY_KEY } from '@/lib/api/me';
import { acceptInvite, getInvite } from '@/lib/api/teams';
import { AuthLayout } from '@/components/auth/auth-layout';
import { AuthLink, AuthNote } from '@/components/auth/auth-link';
import { ROLE_DESCRIPTIONS, ROLE_LABELS, useCurrentTeam } from '@/components/shell/use-current-team';
import { useMe } from '@/components/shell/use-me';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { messageOf } from '@/components/ui/form-errors';
import { Stack } from '@/components/ui/screen';
import { colors, type } from '@/components/ui/theme';

export function InviteScreen({ token }: { token: string }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const me = useMe();
  const { chooseTeam } = useCurrentTeam();
  const invite = useQuery({ queryKey: ['invite', token], queryFn: () => getInvite(token) });
  const accept = useMutation({
    mutationFn: () => acceptInvite(token),
    onSuccess: async (team) => {
      chooseTeam(team.id);
      await queryClient.invalidateQueries({ queryKey: ME_QUERY_KEY });
      router.replace('/');
    },
  });
  const here = `/invite/${encodeURIComponent(token)}`;

  if (invite.isPending) {
    return (
      <AuthLayout title="Invitation">
        <ActivityIndicator color={colors.primary} accessibilityLabel="Loading the invitation" />
      </AuthLayout>
    );
  }
  if (invite.isError) {
    const gone = invite.error instanceof ApiError && invite.error.status === 404;
    return (
      <AuthLayout title="Invitation">
        <Banner tone="error" title={gone ? 'This invitation is no longer valid' : 'Could not open the invitation'}>
          {gone ? 'It may have been used already or have expired (links last 7 days). Ask the team owner for a new one.' : messageOf(invite.error)}
        </Banner>
        <AuthLink href="/">Go to Tubeloom</AuthLink>
      </AuthLayout>
    );
  }

  const { teamName, email, role } = invite.data;
  const signedIn = me.isSuccess;
  return (
    <AuthLayout title={`Join ${teamName}`} subtitle={`You are invited as ${ROLE_LABELS[role].toLowerCase()}.`}>
      <Stack>
        <Card>
          <Text style={[type.small, { color: colors.textMuted }]}>Invitation for</Text>
          <Text style={[type.bodyStrong, { color: colors.text }]}>{email}</Text>
          <Text style={[type.small, { color: colors.textMuted }]}>
            {ROLE_LABELS[role]}: {ROLE_DESCRIPTIONS[role].toLowerCase()}.
          </Text>
        </Card>
        {accept.error ? (
          <Banner tone="error" title="Could not join the team">
            {messageOf(accept.error)}
          </Banner>
        ) : null}
        {signedIn ? (
          <>
            {me.data.user.email.toLowerCase() !== email.toLowerCase() ? (
              <Banner tone="warning">{`You are signed in as ${me.data.user.email}; the invitation was sent to ${email}.`}</Banner>
            ) : null}
            <Button label={`Join ${teamName}`} onPress={() => accept.mutate()} loading={accept.isPending} fullWidth testID="invite-accept" />
          </>
        ) : (
          <>
            <Button label="Sign in to accept" onPress={() => router.push(`/sign-in?next=${encodeURIComponent(here)}`)} fullWidth />
            <AuthNote>
              No account yet? <AuthLink href={`/sign-up?next=${encodeURIComponent(here)}`}>Create one</AuthLink>
            </AuthNote>
          </>
        )}
      </Stack>
    </AuthLayout>
  );
}
