/** The user's own settings: display name and unit system (SI or IP). */
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { Text } from 'react-native';
import { ME_QUERY_KEY, updateMe } from '@/lib/api/me';
import { personNameSchema, type MeReply, type UnitSystem } from '@/lib/schema/api-auth';
import { NotificationSettings } from '@/components/notifications/notification-settings';
import { useMe } from '@/components/shell/use-me';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { fieldErrorsFromApi, messageOf } from '@/components/ui/form-errors';
import { PageHeader, Row, Screen } from '@/components/ui/screen';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { TextField } from '@/components/ui/text-field';
import { colors, FORM_MAX_WIDTH, type } from '@/components/ui/theme';
import { useUnitSystem } from '@/components/ui/use-unit-system';

const UNIT_CHOICES = [
  { value: 'si', label: 'SI', accessibilityLabel: 'SI units: metre, kelvin, pascal, watt' },
  { value: 'ip', label: 'IP', accessibilityLabel: 'IP units: inch, foot, degree Fahrenheit, foot of water, Btu/h' },
] as const;

const UNIT_EXAMPLES: Record<UnitSystem, string> = {
  si: 'Water velocity in m/s, pressure drop in kPa, capacity in kW, temperatures in °C.',
  ip: 'Water velocity in ft/s, water pressure drop in ft of water, air pressure drop in in. w.g., capacity in Btu/h and MBH, temperatures in °F.',
};

function NameForm() {
  const me = useMe();
  const queryClient = useQueryClient();
  const [name, setName] = useState(me.data?.user.name ?? '');
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    if (me.data) setName(me.data.user.name);
  }, [me.data]);
  const save = useMutation({
    mutationFn: (next: string) => updateMe({ name: next }),
    onSuccess: (user) => queryClient.setQueryData<MeReply>(ME_QUERY_KEY, (old) => (old ? { ...old, user } : old)),
    onError: (err) => setError(fieldErrorsFromApi(err).name ?? null),
  });
  const submit = () => {
    const r = personNameSchema.safeParse(name);
    setError(r.success ? null : r.error.issues[0]?.message ?? 'Check the name.');
    if (r.success) save.mutate(r.data);
  };
  const unchanged = name.trim() === me.data?.user.name;
  return (
    <Card title="Your name" style={{ maxWidth: FORM_MAX_WIDTH }}>
      <Text style={[type.small, { color: colors.textMuted }]}>Shown to your team beside the projects and coils you change.</Text>
      <TextField label="Name" value={name} onChangeText={setName} error={error} autoComplete="name" testID="settings-name" onSubmitEditing={submit} />
      {save.isSuccess && unchanged ? <Banner tone="success">Name saved.</Banner> : null}
      {save.error && !error ? <Banner tone="error">{messageOf(save.error)}</Banner> : null}
      <Row>
        <Button label="Save name" onPress={submit} loading={save.isPending} disabled={unchanged} testID="settings-name-save" />
      </Row>
    </Card>
  );
}

function UnitsForm() {
  const { unitSystem, setUnitSystem, isSaving, saveError } = useUnitSystem();
  return (
    <Card title="Units" style={{ maxWidth: FORM_MAX_WIDTH }}>
      <Text style={[type.small, { color: colors.textMuted }]}>How Tubeloom shows and asks for quantities. Designs are stored in SI either way.</Text>
      <Row>
        <SegmentedControl<UnitSystem>
          label="Unit system"
          value={unitSystem}
          options={UNIT_CHOICES}
          onChange={setUnitSystem}
          disabled={isSaving}
          testID="settings-units"
        />
        {isSaving ? <Text style={[type.small, { color: colors.textMuted }]}>Saving…</Text> : null}
      </Row>
      <Text style={[type.small, { color: colors.text }]}>{UNIT_EXAMPLES[unitSystem]}</Text>
      {saveError ? <Banner tone="error">{saveError}</Banner> : null}
    </Card>
  );
}

export function SettingsScreen() {
  const me = useMe();
  return (
    <Screen testID="settings-screen">
      <PageHeader title="Settings" subtitle={me.data ? `Signed in as ${me.data.user.email}` : undefined} />
      <NameForm />
      <UnitsForm />
      <NotificationSettings />
    </Screen>
  );
}
