import { Pressable, Text, View } from 'react-native';

import { Body } from '@/components/ui';
import type { ColumnMapping } from '@/shared/schemas/reading';
import { space } from '@/shared/theme';
import type { LogPreview } from '../api/readings';
import { styles } from './styles';
import { Toggle } from './toggle';

export type MappingDraft = Partial<ColumnMapping>;

const FIELDS: { key: 'time' | 'voltage' | 'current' | 'soc'; label: string; optional: boolean }[] = [
  { key: 'time', label: 'Time column', optional: false },
  { key: 'voltage', label: 'Voltage column', optional: false },
  { key: 'current', label: 'Current column', optional: true },
  { key: 'soc', label: 'State of charge column', optional: true },
];

function Chips<T extends string>({ label, options, value, onChange, testID }: { label: string; options: { value: T; label: string }[]; value: T; onChange: (v: T) => void; testID: string }) {
  return (
    <View style={{ gap: space.xs }} role="radiogroup" aria-label={label}>
      <Text style={styles.label}>{label}</Text>
      <View style={styles.chips}>
        {options.map((o) => {
          const on = value === o.value;
          return (
            <Pressable key={o.value || 'none'} role="radio" aria-checked={on} testID={`${testID}-${o.value || 'none'}`} onPress={() => onChange(o.value)} style={[styles.chip, on && styles.chipOn]}>
              <Text style={[styles.chipText, on && styles.chipTextOn]}>{o.label}</Text>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

/** Which column is which, which way the current counts, and how numbers are written; the rig remembers it. */
export function LogMapping({ file, preview, mapping, onChange }: { file: File; preview: LogPreview; mapping: MappingDraft; onChange: (m: MappingDraft) => void }) {
  const delimiter = preview.delimiter === '\t' ? 'tabs' : preview.delimiter === ';' ? 'semicolons' : 'commas';
  return (
    <View style={{ gap: space.sm }}>
      <Body>
        {file.name}: {preview.rows.toLocaleString()} rows, columns separated by {delimiter}
        {preview.remembered ? ' (columns as last time)' : ''}
      </Body>
      {FIELDS.map((f) => (
        <Chips
          key={f.key}
          label={f.label}
          testID={`map-${f.key}`}
          value={mapping[f.key] ?? ''}
          options={[...(f.optional ? [{ value: '', label: 'None' }] : []), ...preview.columns.map((c) => ({ value: c, label: c }))]}
          onChange={(c) => onChange({ ...mapping, [f.key]: c || undefined })}
        />
      ))}
      {mapping.current ? (
        <Chips
          label="The current in this log is"
          testID="map-sign"
          value={mapping.currentSign ?? 'drawn-positive'}
          options={[
            { value: 'drawn-positive', label: 'Positive when drawn' },
            { value: 'drawn-negative', label: 'Negative when drawn (many monitors)' },
          ]}
          onChange={(currentSign) => onChange({ ...mapping, currentSign })}
        />
      ) : null}
      <Toggle label="Numbers use a decimal comma (12,65)" value={mapping.decimalComma ?? false} onChange={(decimalComma) => onChange({ ...mapping, decimalComma })} testID="map-decimal-comma" />
    </View>
  );
}
