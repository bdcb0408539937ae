import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { ActivityIndicator, Image, Pressable, StyleSheet, Text, View } from 'react-native';
import { z } from 'zod';

import { FilePicker } from '@/components/file-picker';
import { ChoiceField, Form, NumberField, showApiErrors, SubmitButton, SwitchField } from '@/components/form';
import { DateTimeField, localDateTime } from '@/components/pickers';
import { ChipGroup } from '@/components/chips';
import { Toggle } from '@/components/toggle';
import { TextField } from '@/components/text-field';
import { Body, Button, Card, Heading, Small } from '@/components/ui';
import { useIsWide } from '@/components/use-layout';
import { ApiError } from '@/lib/api-client';
import { type ColumnMapping, type ReadingForm, readingSchema, voltageDropSchema, type VoltageDropForm } from '@/shared/schemas/reading';
import { colors, radius, space, type } from '@/shared/theme';
import {
  type LogPreview,
  openPhoto,
  type Readings,
  type UploadResult,
  useLogPreviewMutation,
  useLogUploadMutation,
  usePhotoDeleteMutation,
  usePhotoUploadMutation,
  useReadingsQuery,
  useSpotReadingMutation,
  useUploadDeleteMutation,
  useVoltageDropMutation,
} from '../api/readings';
import { ReadingsChart } from './chart/readings-chart';
import type { ReadingsChartPoint } from '@/components/charts/chart-types';

export const MEASURING_CAUTION =
  'Measuring safely: clip the meter to the battery posts themselves; for a rested reading leave the battery two hours with no charging and nothing switched on. Under load, keep hands and leads clear of the fan and belts, never bridge the terminals with a probe, wear eye protection near a lead-acid battery (it can vent explosive gas), and leave a lithium battery\'s protection system alone. If in doubt, ask a qualified auto electrician. Figures are estimates, not a guarantee.';

type Props = {
  rigId: string;
  canEdit: boolean;
  cableRuns: { id: string; label: string }[];
  /** Sets the rig's key-off draw (the route composes the rig's own update). */
  onAdoptKeyOff?: (amps: number) => Promise<void>;
};

/** Readings: measured voltages and currents against the model, CSV logs, install photos, and what they tell. */
export function ReadingsScreen({ rigId, canEdit, cableRuns, onAdoptKeyOff }: Props) {
  const readings = useReadingsQuery(rigId);
  const wide = useIsWide();
  if (readings.isPending) return <ActivityIndicator color={colors.night} />;
  if (readings.isError) return <Body style={{ color: colors.short }}>{readings.error.message}</Body>;
  const r = readings.data;
  return (
    <View style={{ gap: space.lg }} testID="readings-screen">
      <View style={styles.caution} role="note">
        <Small style={{ color: colors.ink }}>{MEASURING_CAUTION}</Small>
      </View>
      <View style={[{ gap: space.lg }, wide && { flexDirection: 'row', alignItems: 'flex-start' }]}>
        <View style={[{ gap: space.lg }, wide && { flex: 3 }]}>
          <ChartCard readings={r} />
          <AnalysisCard readings={r} canEdit={canEdit} onAdoptKeyOff={onAdoptKeyOff} />
          <UploadsCard rigId={rigId} readings={r} canEdit={canEdit} />
          <PhotosCard rigId={rigId} readings={r} canEdit={canEdit} />
        </View>
        <View style={[{ gap: space.lg }, wide && { flex: 2 }]}>
          {canEdit ? <SpotReadingCard rigId={rigId} /> : null}
          <SpotList readings={r} />
          <DropTestCard rigId={rigId} cableRuns={cableRuns} />
        </View>
      </View>
    </View>
  );
}

function chartPoints(r: Readings): { points: ReadingsChartPoint[]; unit: '%' | 'V' } {
  if (!r.series.length) return { points: [], unit: '%' };
  const t0 = Date.parse(r.series[0].at);
  const hours = (at: string) => (Date.parse(at) - t0) / 3_600_000;
  const withSoc = r.series.filter((s) => s.socPercent !== null);
  const model = (h: number) => {
    const p = r.projected;
    if (!p.length) return null;
    const i = p.findIndex((x) => hours(x.at) >= h);
    if (i <= 0) return i === 0 ? p[0].socPercent : null;
    const [a, b] = [p[i - 1], p[i]];
    const f = (h - hours(a.at)) / Math.max(1e-9, hours(b.at) - hours(a.at));
    return a.socPercent + (b.socPercent - a.socPercent) * f;
  };
  if (withSoc.length >= 2) return { points: withSoc.map((s) => ({ h: hours(s.at), measured: s.socPercent!, model: model(hours(s.at)) })), unit: '%' };
  return { points: r.series.map((s) => ({ h: hours(s.at), measured: s.voltageV, model: null })), unit: 'V' };
}

function ChartCard({ readings }: { readings: Readings }) {
  const { points, unit } = chartPoints(readings);
  return (
    <Card testID="readings-chart-card">
      <Heading>{unit === '%' ? 'State of charge: measured and modelled' : 'Battery voltage'}</Heading>
      {points.length >= 2 ? (
        <>
          <ReadingsChart points={points} unit={unit} />
          <Small>
            {unit === '%'
              ? `Dark line: from the readings (${readings.total.toLocaleString()} in all). Grey: the model, parked, from the first reading's state of charge.`
              : 'The state of charge cannot be told from these readings (mark rested ones, or log a monitor’s state of charge).'}
          </Small>
        </>
      ) : (
        <Small>Add two readings or upload a log to see them charted against the model.</Small>
      )}
    </Card>
  );
}

function AnalysisCard({ readings, canEdit, onAdoptKeyOff }: { readings: Readings; canEdit: boolean; onAdoptKeyOff?: (a: number) => Promise<void> }) {
  const a = readings.analysis;
  const [adopted, setAdopted] = useState<string | null>(null);
  return (
    <Card testID="analysis">
      <Heading>Measured standby</Heading>
      {a.drainA === null ? (
        <Body>{a.reason}</Body>
      ) : (
        <>
          <Text style={styles.figure} testID="measured-drain">
            {a.drainA.toFixed(2)} A
          </Text>
          <Small>
            average drain over {a.hours} quiet hours, {a.method === 'soc' ? 'from the fall in state of charge' : 'from the logged current'}
          </Small>
          {a.standby ? (
            <>
              <Body testID="standby-message">{a.standby.message}</Body>
              {a.standby.causes.length ? (
                <View style={{ gap: 2 }}>
                  <Small>Likely causes to check:</Small>
                  {a.standby.causes.map((c) => (
                    <Small key={c}>• {c}</Small>
                  ))}
                </View>
              ) : null}
              {canEdit && onAdoptKeyOff && !a.standby.matches && a.standby.suggestedKeyOffDrawA !== a.keyOffDrawA ? (
                <Button
                  label={`Use ${a.standby.suggestedKeyOffDrawA} A as the key-off draw`}
                  testID="adopt-key-off"
                  onPress={() => onAdoptKeyOff(a.standby!.suggestedKeyOffDrawA).then(() => setAdopted(`The rig's key-off draw is now ${a.standby!.suggestedKeyOffDrawA} A.`), (e) => setAdopted(e.message))}
                />
              ) : null}
              {adopted ? <Text role="status" style={styles.status}>{adopted}</Text> : null}
            </>
          ) : null}
        </>
      )}
      {a.notes.map((n) => (
        <Small key={n}>{n}</Small>
      ))}
    </Card>
  );
}

const spotForm = readingSchema.extend({ at: z.string().min(1, 'When: pick the date and time of the reading.') });
type SpotForm = z.input<typeof spotForm>;

function SpotReadingCard({ rigId }: { rigId: string }) {
  const save = useSpotReadingMutation(rigId);
  const localNow = localDateTime(new Date());
  const { control, handleSubmit, reset, setError } = useForm<SpotForm>({
    resolver: zodResolver(spotForm),
    defaultValues: { at: localNow, voltageV: Number.NaN, rested: false, place: 'terminals', note: '' },
  });
  const submit = handleSubmit(async (v) => {
    // Without a zone the browser reads it as local time, as the label says.
    const at = new Date(v.at);
    if (Number.isNaN(at.getTime())) return setError('at', { message: 'When: pick the date and time of the reading.' });
    try {
      await save.mutateAsync({ ...(v as ReadingForm), at: at.toISOString() });
      reset({ ...v, voltageV: Number.NaN, currentA: undefined, note: '' });
    } catch (err) {
      showApiErrors(err, setError, 'note');
    }
  });
  return (
    <Form control={control} onSubmit={submit} busy={save.isPending}>
    <Card testID="spot-form">
      <Heading>Add a reading</Heading>
      <DateTimeField control={control} name="at" label="When (your local time)" />
      <NumberField control={control} name="voltageV" label="Battery voltage" unit="V" />
      <NumberField control={control} name="currentA" label="Current (optional, + when drawn)" unit="A" />
      <SwitchField control={control} name="rested" label="Rested" hint="No charging and nothing switched on for two hours or more." />
      <ChoiceField
        control={control}
        name="place"
        label="Measured at"
        options={[
          { value: 'terminals', label: 'Battery posts' },
          { value: 'device', label: 'A device' },
          { value: 'ground', label: 'A ground point' },
        ]}
      />
      <TextField control={control} name="note" label="Note (optional)" maxLength={500} />
      <SubmitButton label="Save reading" testID="save-reading" />
    </Card>
    </Form>
  );
}

function SpotList({ readings }: { readings: Readings }) {
  if (!readings.spot.length) return null;
  return (
    <Card testID="spot-list">
      <Heading>Typed readings</Heading>
      {readings.spot.slice(0, 20).map((s) => (
        <View key={s.id} style={styles.row}>
          <Body>
            {s.voltageV} V{s.currentA !== null ? ` · ${s.currentA} A` : ''}
            {s.socPercent !== null ? ` · ${Math.round(s.socPercent)} %` : ''}
            {s.rested ? ' · rested' : ''}
          </Body>
          <Small>
            {new Date(s.at).toLocaleString()} · {s.place === 'terminals' ? 'battery posts' : s.place === 'device' ? 'at a device' : 'at a ground point'}
            {s.by ? ` · ${s.by}` : ''}
            {s.note ? ` · ${s.note}` : ''}
          </Small>
        </View>
      ))}
    </Card>
  );
}

const FIELDS: { key: keyof ColumnMapping; label: string; optional: boolean }[] = [
  { key: 'time', label: 'Time column', optional: false },
  { key: 'voltage', label: 'Voltage column', optional: false },
  { key: 'current', label: 'Current column', optional: true },
  { key: 'soc', label: 'State of charge column', optional: true },
];

function UploadsCard({ rigId, readings, canEdit }: { rigId: string; readings: Readings; canEdit: boolean }) {
  const preview = useLogPreviewMutation(rigId);
  const upload = useLogUploadMutation(rigId);
  const remove = useUploadDeleteMutation(rigId);
  const [file, setFile] = useState<File | null>(null);
  const [p, setP] = useState<LogPreview | null>(null);
  const [mapping, setMapping] = useState<Partial<ColumnMapping>>({});
  const [allOrNothing, setAllOrNothing] = useState(false);
  const [rested, setRested] = useState(false);
  const [result, setResult] = useState<UploadResult | null>(null);
  const error = preview.error ?? upload.error;
  const pick = async (f: File) => {
    setFile(f);
    setResult(null);
    upload.reset();
    const got = await preview.mutateAsync(f).catch(() => null);
    setP(got);
    setMapping(got?.mapping ?? {});
  };
  const send = async () => {
    if (!file || !mapping.time || !mapping.voltage) return;
    const r = await upload.mutateAsync({ file, mapping: mapping as ColumnMapping, allOrNothing, rested }).catch(() => null);
    if (r) {
      setResult(r);
      setP(null);
      setFile(null);
    }
  };
  const apiErrors = upload.error instanceof ApiError ? upload.error.fields : [];
  return (
    <Card testID="uploads">
      <Heading>Logs</Heading>
      <Small>A CSV file from a battery monitor or logger: a time column and a voltage column, and if you have them current and state of charge. Up to 10 MB and 200,000 rows.</Small>
      {canEdit ? <FilePicker label="Choose a CSV log" accept=".csv,text/csv,text/plain" onPick={pick} testID="pick-log" /> : null}
      {preview.isPending ? <ActivityIndicator color={colors.night} /> : null}
      {p && file ? (
        <View style={{ gap: space.sm }} testID="mapping">
          <Body>
            {file.name}: {p.rows.toLocaleString()} rows{p.remembered ? ' (columns as last time)' : ''}
          </Body>
          {FIELDS.map((f) => (
            <ChipGroup
              key={f.key}
              label={f.label}
              options={[...(f.optional ? [''] : []), ...p.columns].map((c) => ({ value: c, label: c || 'None', testID: `map-${f.key}-${c || 'none'}` }))}
              value={mapping[f.key] ?? ''}
              onChange={(c) => setMapping({ ...mapping, [f.key]: c || undefined })}
              testIDPrefix={`map-${f.key}`}
            />
          ))}
          <Toggle label="Every row is a rested battery (parked, nothing on)" value={rested} onChange={setRested} testID="log-rested" />
          <Toggle label="All or nothing: store nothing if any row is bad" value={allOrNothing} onChange={setAllOrNothing} testID="log-all-or-nothing" />
          <Button label="Upload log" onPress={send} busy={upload.isPending} disabled={!mapping.time || !mapping.voltage} testID="upload-log" />
        </View>
      ) : null}
      {error ? (
        <View role="alert" style={{ gap: 2 }}>
          <Text style={styles.error}>{error.message}</Text>
          {apiErrors.slice(0, 10).map((e) => (
            <Small key={e.path}>
              {e.path}: {e.message}
            </Small>
          ))}
        </View>
      ) : null}
      {result ? (
        <View role="status" testID="upload-result" style={{ gap: 2 }}>
          <Body>
            {result.upload.rowCount.toLocaleString()} rows stored{result.upload.errorCount ? `, ${result.upload.errorCount} refused:` : '.'}
          </Body>
          {result.errors.slice(0, 10).map((e) => (
            <Small key={e.line}>
              line {e.line}: {e.reason}
            </Small>
          ))}
        </View>
      ) : null}
      {readings.uploads.map((u) => (
        <View key={u.id} style={styles.row} testID={`upload-${u.fileName}`}>
          <Body>
            {u.fileName}: {u.rowCount.toLocaleString()} rows{u.errorCount ? `, ${u.errorCount} refused` : ''}
          </Body>
          <Small>
            {new Date(u.createdAt).toLocaleString()}
            {u.by ? ` · ${u.by}` : ''}
          </Small>
          {u.errors.slice(0, 3).map((e) => (
            <Small key={e.line}>
              line {e.line}: {e.reason}
            </Small>
          ))}
          {canEdit ? (
            <Pressable role="button" onPress={() => remove.mutate(u.id)} style={styles.chip}>
              <Text style={styles.chipText}>Delete log and its rows</Text>
            </Pressable>
          ) : null}
        </View>
      ))}
    </Card>
  );
}

function PhotosCard({ rigId, readings, canEdit }: { rigId: string; readings: Readings; canEdit: boolean }) {
  const up = usePhotoUploadMutation(rigId);
  const remove = usePhotoDeleteMutation(rigId);
  const captionForm = useForm<{ caption: string }>({ defaultValues: { caption: '' } });
  return (
    <Card testID="photos">
      <Heading>Install photos</Heading>
      <Small>JPEG or PNG, up to 10 MB; the advisor sees them here and beside the Notes. Location data is removed from the photo.</Small>
      {canEdit ? (
        <>
          <TextField control={captionForm.control} name="caption" label="Caption (optional)" maxLength={200} />
          <FilePicker label="Add a photo" accept="image/jpeg,image/png" onPick={(file) => up.mutate({ file, caption: captionForm.getValues('caption') }, { onSuccess: () => captionForm.reset({ caption: '' }) })} testID="pick-photo" />
        </>
      ) : null}
      {up.isPending ? <ActivityIndicator color={colors.night} /> : null}
      {up.error ? <Text role="alert" style={styles.error}>{up.error.message}</Text> : null}
      <View style={styles.photos}>
        {readings.photos.map((ph) => (
          <View key={ph.id} style={styles.photo} testID={`photo-${ph.id}`}>
            <Pressable role="link" aria-label={`Open ${ph.caption || ph.fileName}`} onPress={() => openPhoto(rigId, ph.id).then((url) => globalThis.open?.(url, '_blank', 'noopener'))}>
              <Image source={{ uri: ph.thumbUrl }} style={styles.thumb} accessibilityLabel={ph.caption || ph.fileName} />
            </Pressable>
            <Small>{ph.caption || ph.fileName}</Small>
            {canEdit ? (
              <Pressable role="button" onPress={() => remove.mutate(ph.id)}>
                <Text style={styles.link}>Delete</Text>
              </Pressable>
            ) : null}
          </View>
        ))}
      </View>
    </Card>
  );
}

function DropTestCard({ rigId, cableRuns }: { rigId: string; cableRuns: { id: string; label: string }[] }) {
  const test = useVoltageDropMutation(rigId);
  const { control, handleSubmit } = useForm<VoltageDropForm & { run: string }>({
    resolver: zodResolver(voltageDropSchema.extend({ run: z.string() })) as never,
    defaultValues: { batteryV: Number.NaN, pointV: Number.NaN, currentA: Number.NaN, run: '' },
  });
  const submit = handleSubmit((v) => test.mutate({ batteryV: v.batteryV, pointV: v.pointV, currentA: v.currentA, ...(v.run ? { cableRunId: v.run } : {}) }));
  return (
    <Form control={control} onSubmit={submit} busy={test.isPending}>
    <Card testID="drop-test">
      <Heading>Voltage-drop test</Heading>
      <Small>With a known current flowing (the device on), measure at the battery posts and at the device or its ground point.</Small>
      <NumberField control={control} name="batteryV" label="At the battery" unit="V" />
      <NumberField control={control} name="pointV" label="At the device or ground point" unit="V" />
      <NumberField control={control} name="currentA" label="Current flowing" unit="A" />
      {cableRuns.length ? <ChoiceField control={control} name="run" label="Cable run" options={[{ value: '', label: 'None' }, ...cableRuns.map((r) => ({ value: r.id, label: r.label }))]} /> : null}
      <SubmitButton label="Check the connection" testID="run-drop-test" />
      {test.data ? (
        <View role="status" style={{ gap: 2 }}>
          <Body style={test.data.flagged ? { color: colors.short } : undefined}>{test.data.message}</Body>
          <Small>
            {test.data.dropV} V · {test.data.dropPercent} % · {test.data.resistanceOhm} Ω
          </Small>
        </View>
      ) : null}
      {test.error ? <Text role="alert" style={styles.error}>{test.error.message}</Text> : null}
    </Card>
    </Form>
  );
}

const styles = StyleSheet.create({
  caution: { backgroundColor: '#FFF4DC', borderColor: colors.lampDeep, borderWidth: 1, borderRadius: radius.md, padding: space.md },
  figure: { ...type.figure, color: colors.night },
  row: { gap: 2, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  label: { ...type.heading, fontSize: 15, color: colors.ink },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: { minHeight: 44, minWidth: 44, justifyContent: 'center', borderWidth: 1, borderColor: colors.inkSoft, borderRadius: 999, paddingHorizontal: space.md, paddingVertical: space.xs, backgroundColor: colors.card, alignSelf: 'flex-start' },
  chipOn: { backgroundColor: colors.night, borderColor: colors.night },
  chipText: { ...type.small, color: colors.ink, fontFamily: 'Nunito_700Bold' },
  chipTextOn: { color: colors.paper },
  error: { ...type.small, color: colors.short, fontFamily: 'Nunito_700Bold' },
  box: { width: 20, height: 20, borderRadius: 4, borderWidth: 1, borderColor: colors.night, alignItems: 'center', justifyContent: 'center' },
  boxOn: { backgroundColor: colors.night },
  photos: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  photo: { width: 160, gap: 4 },
  thumb: { width: 160, height: 120, borderRadius: radius.sm, backgroundColor: colors.paper },
  link: { ...type.small, color: colors.focus, fontFamily: 'Nunito_700Bold' },
  status: { ...type.small, color: colors.comfortable, fontFamily: 'Nunito_700Bold' },
});
