import { useState } from 'react';
import { ActivityIndicator, Text, View } from 'react-native';

import { FilePicker } from '@/components/file-picker';
import { Body, Button, Card, Heading, Small } from '@/components/ui';
import { ApiError } from '@/lib/api-client';
import type { ColumnMapping } from '@/shared/schemas/reading';
import { colors, space } from '@/shared/theme';
import { type LogPreview, type Readings, type UploadResult, useLogPreviewMutation, useLogUploadMutation, useUploadDeleteMutation } from '../api/readings';
import { LogMapping, type MappingDraft } from './log-mapping';
import { styles } from './styles';
import { DeleteButton, Toggle } from './toggle';

/** CSV logs: choose a file, map its columns, upload; the logs kept, each with its rows, deletable. */
export function UploadsCard({ rigId, readings, canEdit }: { rigId: string; readings: Readings; canEdit: boolean }) {
  const preview = useLogPreviewMutation(rigId);
  const upload = useLogUploadMutation(rigId);
  const remove = useUploadDeleteMutation(rigId);
  const [file, setFile] = useState<File | null>(null);
  const [p, setP] = useState<LogPreview | null>(null);
  const [mapping, setMapping] = useState<MappingDraft>({});
  const [allOrNothing, setAllOrNothing] = useState(false);
  const [rested, setRested] = useState(false);
  const [result, setResult] = useState<UploadResult | null>(null);
  const error = preview.error ?? upload.error ?? remove.error;
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
      setRested(false);
    }
  };
  const apiErrors = upload.error instanceof ApiError ? upload.error.fields : [];
  return (
    <Card testID="uploads">
      <Heading>Logs</Heading>
      <Small>
        A CSV file from a battery monitor or logger (commas, semicolons or tabs): a time column and a voltage column, and if you have them current and state of charge. Up to 10 MB and 200,000 rows a file; a rig keeps
        250,000 readings in all. Times without a zone are read in your time zone ({readings.timeZone}).
      </Small>
      {canEdit ? <FilePicker label="Choose a CSV log" accept=".csv,.txt,text/csv,text/plain,text/tab-separated-values" onPick={pick} testID="pick-log" /> : null}
      {preview.isPending ? <ActivityIndicator color={colors.night} /> : null}
      {p && file ? (
        <View style={{ gap: space.sm }} testID="mapping">
          <LogMapping file={file} preview={p} mapping={mapping} onChange={setMapping} />
          <Toggle label="Every row is a rested battery (parked, nothing on, no more than a trickle)" value={rested} onChange={setRested} testID="log-rested" />
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
          {result.notes.map((n) => (
            <Small key={n}>{n}</Small>
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
          {u.canDelete ? <DeleteButton label="Delete log and its rows" onDelete={() => remove.mutate(u.id)} testID={`delete-log-${u.fileName}`} /> : null}
        </View>
      ))}
    </Card>
  );
}
