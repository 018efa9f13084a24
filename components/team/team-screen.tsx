/**
 * The current team: members with their roles and pending invitations. Owners invite by e-mail with a role,
 * change roles and remove members; the server refuses to leave a team without an owner and its message is shown.
 */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import { ME_QUERY_KEY } from '@/lib/api/me';
import { changeMemberRole, inviteMember, listMembers, removeMember } from '@/lib/api/teams';
import type { Role } from '@/lib/schema/api-auth';
import { inviteBodySchema, type Member } from '@/lib/schema/api-teams';
import { ROLE_DESCRIPTIONS, ROLE_LABELS, useCurrentTeam } from '@/components/shell/use-current-team';
import { useMe } from '@/components/shell/use-me';
import { formatWhen } from '@/components/projects/format';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmSheet } from '@/components/ui/confirm-sheet';
import { fieldErrorsFromApi, messageOf, validate, type FieldErrors } from '@/components/ui/form-errors';
import { PageHeader, Row, Screen } from '@/components/ui/screen';
import { Select } from '@/components/ui/select';
import { TextField } from '@/components/ui/text-field';
import { colors, radius, space, type } from '@/components/ui/theme';
import { useBreakpoint } from '@/components/ui/use-breakpoint';

const ROLES: readonly Role[] = ['owner', 'designer', 'reviewer', 'viewer'];
const ROLE_OPTIONS = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r], description: ROLE_DESCRIPTIONS[r] }));

function InviteForm({ teamId }: { teamId: string }) {
  const queryClient = useQueryClient();
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<Role>('designer');
  const [errors, setErrors] = useState<FieldErrors>({});
  const [sentTo, setSentTo] = useState<string | null>(null);
  const invite = useMutation({
    mutationFn: (body: { email: string; role: Role }) => inviteMember(teamId, body),
    onSuccess: (inv) => {
      setSentTo(inv.email);
      setEmail('');
      void queryClient.invalidateQueries({ queryKey: ['members', teamId] });
    },
    onError: (err) => setErrors(fieldErrorsFromApi(err)),
  });
  const submit = () => {
    setSentTo(null);
    const r = validate(inviteBodySchema, { email, role });
    setErrors(r.errors ?? {});
    if (r.data) invite.mutate(r.data);
  };
  const formError = invite.error && Object.keys(fieldErrorsFromApi(invite.error)).length === 0 ? messageOf(invite.error) : null;
  return (
    <Card title="Invite someone">
      <Text style={[type.small, { color: colors.textMuted }]}>They get an e-mail with a link that works once, for 7 days.</Text>
      {sentTo ? <Banner tone="success">{`Invitation sent to ${sentTo}.`}</Banner> : null}
      {formError ? <Banner tone="error" title="Could not send the invitation">{formError}</Banner> : null}
      <Row align="flex-start">
        <View style={styles.inviteEmail}>
          <TextField
            label="E-mail"
            value={email}
            onChangeText={setEmail}
            error={errors.email}
            inputMode="email"
            autoCapitalize="none"
            autoComplete="off"
            testID="invite-email"
            onSubmitEditing={submit}
          />
        </View>
        <View style={styles.inviteRole}>
          <Select<Role> label="Role" value={role} options={ROLE_OPTIONS} onChange={setRole} testID="invite-role" />
          {errors.role ? <Text style={[type.small, { color: colors.danger }]}>{errors.role}</Text> : null}
        </View>
      </Row>
      <Row>
        <Button label="Send invitation" onPress={submit} loading={invite.isPending} testID="invite-submit" />
      </Row>
    </Card>
  );
}

function MemberRow({ m, teamId, isOwner, isMe }: { m: Member; teamId: string; isOwner: boolean; isMe: boolean }) {
  const queryClient = useQueryClient();
  const { isWide } = useBreakpoint();
  const [confirming, setConfirming] = useState(false);
  const refresh = () => {
    void queryClient.invalidateQueries({ queryKey: ['members', teamId] });
    if (isMe) void queryClient.invalidateQueries({ queryKey: ME_QUERY_KEY });
  };
  const change = useMutation({ mutationFn: (role: Role) => changeMemberRole(teamId, m.userId, role), onSuccess: refresh });
  const remove = useMutation({
    mutationFn: () => removeMember(teamId, m.userId),
    onSuccess: () => {
      setConfirming(false);
      refresh();
    },
  });
  return (
    <View style={[styles.member, isWide && styles.memberWide]} role="listitem" accessibilityLabel={`${m.name}, ${ROLE_LABELS[m.role]}`}>
      <View style={styles.memberWho}>
        <Text style={[type.bodyStrong, { color: colors.text }]} numberOfLines={1}>
          {m.name}
          {isMe ? <Text style={[type.small, { color: colors.textMuted }]}> (you)</Text> : null}
        </Text>
        <Text style={[type.small, { color: colors.textMuted }]} numberOfLines={1}>
          {m.email}
        </Text>
      </View>
      {isOwner ? (
        <Row style={styles.memberActions}>
          <View style={styles.roleSelect}>
            <Select<Role>
              label={`Role of ${m.name}`}
              hideLabel
              value={m.role}
              options={ROLE_OPTIONS}
              onChange={(r) => change.mutate(r)}
              disabled={change.isPending}
            />
          </View>
          {change.isPending ? <ActivityIndicator color={colors.primary} accessibilityLabel="Changing role" /> : null}
          <Button label="Remove" variant="ghost" size="sm" onPress={() => setConfirming(true)} accessibilityLabel={`Remove ${m.name} from the team`} />
        </Row>
      ) : (
        <View style={styles.roleTag}>
          <Text style={[type.smallStrong, { color: colors.primaryPressed }]}>{ROLE_LABELS[m.role]}</Text>
        </View>
      )}
      {change.error ? (
        <View style={styles.fullRow}>
          <Banner tone="error" title="Role not changed">
            {messageOf(change.error)}
          </Banner>
        </View>
      ) : null}
      <ConfirmSheet
        open={confirming}
        title={`Remove ${m.name}?`}
        message={`${m.name} (${m.email}) will lose access to this team's projects and coils. You can invite them again later.`}
        confirmLabel="Remove from team"
        onConfirm={() => remove.mutate()}
        onClose={() => {
          setConfirming(false);
          remove.reset();
        }}
        busy={remove.isPending}
        error={remove.error ? messageOf(remove.error) : null}
      />
    </View>
  );
}

export function TeamScreen() {
  const { team } = useCurrentTeam();
  const me = useMe();
  const members = useQuery({
    queryKey: ['members', team?.id],
    queryFn: () => listMembers(team!.id),
    enabled: Boolean(team),
  });
  if (!team) {
    return (
      <Screen>
        <PageHeader title="Team" />
        <Banner tone="warning">You are not in any team yet.</Banner>
      </Screen>
    );
  }
  const isOwner = team.role === 'owner';
  return (
    <Screen testID="team-screen">
      <PageHeader title={team.name} subtitle={`Your role: ${ROLE_LABELS[team.role]}. ${ROLE_DESCRIPTIONS[team.role]}.`} />
      {isOwner ? <InviteForm teamId={team.id} /> : null}
      <Card title="Members">
        {members.isPending ? <ActivityIndicator color={colors.primary} accessibilityLabel="Loading members" /> : null}
        {members.isError ? (
          <Banner tone="error" title="Could not load the members">
            {messageOf(members.error)}
          </Banner>
        ) : null}
        {members.data ? (
          <View role="list" accessibilityLabel="Members" style={styles.list}>
            {members.data.members.map((m) => (
              <MemberRow key={m.userId} m={m} teamId={team.id} isOwner={isOwner} isMe={m.userId === me.data?.user.id} />
            ))}
          </View>
        ) : null}
      </Card>
      {members.data && members.data.invites.length > 0 ? (
        <Card title="Pending invitations">
          <View role="list" accessibilityLabel="Pending invitations" style={styles.list}>
            {members.data.invites.map((inv) => (
              <View key={inv.id} role="listitem" style={styles.member}>
                <View style={styles.memberWho}>
                  <Text style={[type.bodyStrong, { color: colors.text }]} numberOfLines={1}>
                    {inv.email}
                  </Text>
                  <Text style={[type.small, { color: colors.textMuted }]}>
                    {ROLE_LABELS[inv.role]} · link valid until {formatWhen(inv.expiresAt)}
                  </Text>
                </View>
              </View>
            ))}
          </View>
        </Card>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  inviteEmail: { flexGrow: 2, flexBasis: 240 },
  inviteRole: { flexGrow: 1, flexBasis: 160, gap: space.xs },
  list: { gap: 0 },
  member: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.sm,
    paddingVertical: space.md,
    borderBottomWidth: 1,
    borderBottomColor: colors.border,
  },
  memberWide: { flexWrap: 'nowrap' },
  memberWho: { flexGrow: 1, flexShrink: 1, flexBasis: 200, minWidth: 0, gap: space.xxs },
  memberActions: { flexShrink: 0 },
  roleSelect: { width: 150 },
  roleTag: { backgroundColor: colors.primarySoft, borderRadius: radius.pill, paddingHorizontal: space.md, paddingVertical: space.xxs },
  fullRow: { flexBasis: '100%' },
});
