// On the web the browser's own pickers: a time or date-and-time input and a select, shown in the
// reader's locale (12- or 24-hour clock, date order) by the browser itself.
import { colors, radius, space, type } from '@/shared/theme';
import type { NativeInputProps, SelectInputProps } from './native-inputs';

// DOM styles: a bare number for lineHeight would multiply the font size, so it is given in px.
const base = {
  fontFamily: type.body.fontFamily,
  lineHeight: `${type.body.lineHeight}px`,
  minHeight: 44,
  boxSizing: 'border-box',
  border: `1px solid ${colors.inkSoft}`,
  borderRadius: radius.sm,
  padding: `${space.sm}px ${space.md}px`,
  backgroundColor: colors.card,
  color: colors.ink,
  fontSize: type.body.fontSize,
  maxWidth: '100%',
} as const;
const invalid = { border: `2px solid ${colors.short}` };
const readOnlyStyle = { backgroundColor: colors.paper };

/** kind "time": a whole hour ("18:00"); kind "datetime": local date and time ("2026-12-01T18:30"). */
export function NativeInput({ kind, value, onChange, onBlur, labelledBy, describedBy, invalid: bad, readOnly, testID, inputRef, onEnter }: NativeInputProps) {
  return (
    <input
      ref={inputRef as never}
      type={kind === 'time' ? 'time' : 'datetime-local'}
      step={kind === 'time' ? 3600 : 60}
      value={value}
      onChange={(e) => onChange(e.currentTarget.value)}
      onBlur={onBlur}
      onKeyDown={(e) => {
        if (e.key === 'Enter') {
          e.preventDefault();
          onEnter?.();
        }
      }}
      readOnly={readOnly}
      aria-labelledby={labelledBy}
      aria-describedby={describedBy}
      aria-invalid={bad || undefined}
      data-testid={testID}
      style={{ ...base, ...(bad ? invalid : {}), ...(readOnly ? readOnlyStyle : {}) }}
    />
  );
}

export function SelectInput({ value, options, onChange, onBlur, labelledBy, describedBy, invalid: bad, readOnly, testID, inputRef }: SelectInputProps) {
  return (
    <select
      ref={inputRef as never}
      value={value}
      disabled={readOnly}
      onChange={(e) => onChange(e.currentTarget.value)}
      onBlur={onBlur}
      aria-labelledby={labelledBy}
      aria-describedby={describedBy}
      aria-invalid={bad || undefined}
      data-testid={testID}
      style={{ ...base, ...(bad ? invalid : {}) }}
    >
      {options.map((o) => (
        <option key={o.value} value={o.value}>
          {o.label}
        </option>
      ))}
    </select>
  );
}
