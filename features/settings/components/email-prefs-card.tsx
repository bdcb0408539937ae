import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import { ActivityIndicator, Text } from 'react-native';

import { ChoiceField, Form, showApiErrors, SubmitButton, SwitchField } from '@/components/form';
import { HourField, TimeZoneField } from '@/components/pickers';
import { Body, Card, Heading, Small } from '@/components/ui';
import { type EmailPrefs, emailPrefsSchema } from '@/shared/schemas/email-prefs';
import { colors } from '@/shared/theme';
import { useEmailPrefsMutation, useEmailPrefsQuery } from '../api/email-prefs';

const WEEKDAYS = ['Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday', 'Sunday'].map((label, value) => ({ value, label }));
const deviceZone = () => {
  try {
    return Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
  } catch {
    return 'UTC';
  }
};

/** E-mail preferences: the weekly report's day and hour in your zone, warnings and their threshold, note e-mails. */
export function EmailPrefsCard() {
  const prefs = useEmailPrefsQuery();
  if (prefs.isPending) return <ActivityIndicator color={colors.night} />;
  if (prefs.isError) return <Body style={{ color: colors.short }}>{prefs.error.message}</Body>;
  // Until someone saves, the zone offered is this device's.
  const { saved, ...values } = prefs.data;
  return <PrefsForm initial={saved ? values : { ...values, timeZone: deviceZone() }} saved={saved} />;
}

function PrefsForm({ initial, saved }: { initial: EmailPrefs; saved: boolean }) {
  const save = useEmailPrefsMutation();
  const { control, handleSubmit, setError } = useForm<EmailPrefs>({ resolver: zodResolver(emailPrefsSchema), defaultValues: initial });
  const reportsOn = useWatch({ control, name: 'reportsOn' });
  const warningsOn = useWatch({ control, name: 'warningsOn' });
  const submit = handleSubmit(async ({ ...values }) => {
    try {
      await save.mutateAsync(values);
    } catch (err) {
      showApiErrors(err, setError, 'timeZone');
    }
  });
  return (
    <Form control={control} onSubmit={submit} busy={save.isPending}>
    <Card testID="email-prefs">
      <Heading>E-mail</Heading>
      <Small>For every rig you share. Each e-mail also has a link that turns its kind off in one click.</Small>
      <SwitchField control={control} name="reportsOn" label="Weekly budget report" hint="Days parked, the margin, the biggest drains and the top Fixes for the week ahead." />
      {reportsOn ? (
        <>
          <ChoiceField control={control} name="reportWeekday" label="Report day" options={WEEKDAYS} />
          <HourField control={control} name="reportHour" label="Report time" hint="To the hour, in the time zone below." />
          <TimeZoneField control={control} name="timeZone" label="Time zone" hint="This device's zone until you choose another." />
        </>
      ) : null}
      <SwitchField control={control} name="warningsOn" label="Low-margin warning" hint="One e-mail when a rig's margin falls, with what changed and the top Fix; no repeat until it recovers." />
      {warningsOn ? (
        <ChoiceField
          control={control}
          name="warnAt"
          label="Warn me when the margin is"
          options={[
            { value: 'tight', label: 'Tight or Short' },
            { value: 'short', label: 'Short only' },
          ]}
        />
      ) : null}
      <SwitchField control={control} name="noteEmailsOn" label="New notes" hint="Notes written within 10 minutes come together in one e-mail." />
      <SubmitButton label="Save e-mail preferences" testID="save-email-prefs" />
      {save.isSuccess ? <Text role="status" style={{ color: colors.comfortable }}>Saved.</Text> : !saved ? <Small>Not saved yet: these are the defaults.</Small> : null}
    </Card>
    </Form>
  );
}
