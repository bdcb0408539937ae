import { zodResolver } from '@hookform/resolvers/zod';
import { Link } from 'expo-router';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Pressable, StyleSheet, Text, View } from 'react-native';

import { NumberField } from '@/components/form';
import { Button, Card, Heading, Small } from '@/components/ui';
import { explainAssumptions } from '@/shared/energy/assumptions';
import { type CutoffForm, cutoffFormSchema } from '@/shared/schemas/rig';
import { colors, linkTarget, space, type } from '@/shared/theme';
import { type Outlook, type Rig, useRigQuery, useRigUpdateMutation } from '../../api/rig';

/** "How this was worked out": every assumption behind the Outlook's figures, its source, and where to change it. */
export function WorkedOut({ rigId, outlook }: { rigId: string; outlook: Outlook }) {
  const rig = useRigQuery(rigId);
  const [open, setOpen] = useState(false);
  if (!rig.data) return null;
  const rows = explainAssumptions(rig.data.power, outlook.assumptions, outlook.horizonDays);
  return (
    <Card testID="worked-out">
      <Pressable role="button" aria-expanded={open} onPress={() => setOpen(!open)} style={styles.toggle} testID="worked-out-toggle">
        <Heading>How this was worked out</Heading>
        <Text style={styles.chevron}>{open ? '▲' : '▼'}</Text>
      </Pressable>
      {open ? (
        <>
          <Small>The figures above are estimates from these assumptions, hour by hour over the horizon. A source marked common practice or from memory is a typical figure rather than a published one.</Small>
          {rows.map((a) => (
            <View key={a.key} style={styles.row} testID={`assumption-${a.key}`}>
              <Text style={styles.label}>{a.label}</Text>
              <Text style={styles.value}>{a.value}</Text>
              <Small>Source: {a.source}</Small>
              {a.changeOn === 'power' ? (
                <Link href={{ pathname: '/rigs/[rigId]/power', params: { rigId } }} style={styles.link}>
                  Change on Power
                </Link>
              ) : null}
            </View>
          ))}
          {rig.data.permissions.edit ? <CutoffSetting key={rig.data.version} rig={rig.data} current={outlook.cutoffSocPercent} /> : <Small>Only an owner changes the cut-off.</Small>}
        </>
      ) : null}
    </Card>
  );
}

function CutoffSetting({ rig, current }: { rig: Rig; current: number }) {
  const update = useRigUpdateMutation(rig.id);
  const own = rig.power.battery.cutoffSocPercent;
  const form = useForm<CutoffForm, unknown, CutoffForm>({ resolver: zodResolver(cutoffFormSchema), defaultValues: { cutoffSocPercent: own ?? current }, mode: 'onTouched' });
  const save = (cutoffSocPercent: number | undefined) => {
    const { cutoffSocPercent: _old, ...battery } = rig.power.battery;
    update.mutate({ version: rig.version, power: { ...rig.power, battery: cutoffSocPercent === undefined ? battery : { ...battery, cutoffSocPercent } } });
  };
  return (
    <View style={styles.cutoff} testID="cutoff-setting">
      <Heading>Set the cut-off</Heading>
      <Small>The lowest state of charge the figures count down to. Going lower shortens a lead-acid battery&apos;s life; a starting battery needs a reserve to crank.</Small>
      <NumberField control={form.control} name="cutoffSocPercent" label="Cut-off" unit="%" />
      <View style={{ flexDirection: 'row', gap: space.md, flexWrap: 'wrap' }}>
        <Button testID="cutoff-save" label="Use this cut-off" onPress={form.handleSubmit((v) => save(v.cutoffSocPercent))} busy={update.isPending} />
        {own !== undefined ? <Button label="Back to the default" onPress={() => save(undefined)} busy={update.isPending} /> : null}
      </View>
      {update.isError ? (
        <Text role="alert" style={{ ...type.body, color: colors.short }}>
          {update.error.message}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  toggle: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', minHeight: 44 },
  chevron: { ...type.body, color: colors.inkSoft },
  row: { gap: 2, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  label: { ...type.small, color: colors.inkSoft, fontFamily: 'Nunito_700Bold' },
  value: { ...type.body, color: colors.ink },
  link: { color: colors.focus, fontFamily: 'Nunito_700Bold', fontSize: 14, ...linkTarget },
  cutoff: { gap: space.sm, paddingTop: space.md, borderTopWidth: 1, borderTopColor: colors.line },
});
