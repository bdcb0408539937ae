// The frame every form's fields sit in: how Enter submits, whether fields are read-only, and the
// small parts all fields share (the hint or error under a field, the field styles).
import { createContext, type ReactNode, useCallback, useContext, useMemo, useRef } from 'react';
import type { Control, FieldValues } from 'react-hook-form';
import { Platform, StyleSheet, Text } from 'react-native';

import { colors, radius, space, type } from '@/shared/theme';

type FormFrame = { submit: () => void; busy: boolean; readOnly: boolean; control: Control<any> | null };
const FormContext = createContext<FormFrame>({ submit: () => undefined, busy: false, readOnly: false, control: null });
/** The frame a field is in: Enter in a one-line field submits through it; read-only frames make fields read-only. */
export const useFormFrame = () => useContext(FormContext);

/**
 * Wraps a form's fields and its SubmitButton. `onSubmit` is react-hook-form's handleSubmit(...): it checks
 * every field at once and focuses the first with an error, which brings it into view; a second press or
 * Enter while the first is still checking or saving does nothing.
 */
export function Form<T extends FieldValues>({ control, onSubmit, busy = false, readOnly = false, children }: { control: Control<T>; onSubmit: () => Promise<void> | void; busy?: boolean; readOnly?: boolean; children: ReactNode }) {
  const running = useRef(false);
  const submit = useCallback(() => {
    if (running.current || busy || readOnly) return;
    running.current = true;
    void Promise.resolve(onSubmit()).finally(() => {
      running.current = false;
      // The focused field with an error: centre it (a focus alone may leave it under the browser's edge).
      if (Platform.OS === 'web' && typeof document !== 'undefined') {
        const el = document.activeElement as HTMLElement | null;
        if (el?.getAttribute('aria-invalid') === 'true') el.scrollIntoView?.({ block: 'center' });
      }
    });
  }, [onSubmit, busy, readOnly]);
  const value = useMemo(() => ({ submit, busy, readOnly, control: control as Control<any> }), [submit, busy, readOnly, control]);
  return <FormContext.Provider value={value}>{children}</FormContext.Provider>;
}

/** A field's hint, or its error in its place; both are tied to the input by aria-describedby. */
export function FieldNote({ id, hint, error }: { id: string; hint?: string; error?: string }) {
  if (error)
    return (
      <Text nativeID={`${id}-error`} style={fieldStyles.error}>
        {error}
      </Text>
    );
  return hint ? (
    <Text nativeID={`${id}-hint`} style={fieldStyles.hint}>
      {hint}
    </Text>
  ) : null;
}

export const fieldStyles = StyleSheet.create({
  field: { gap: space.xs },
  label: { ...type.heading, fontSize: 15, color: colors.ink },
  input: { ...type.body, minHeight: 44, borderWidth: 1, borderColor: colors.inkSoft, borderRadius: radius.sm, paddingHorizontal: space.md, paddingVertical: space.sm, backgroundColor: colors.card, color: colors.ink },
  inputReadOnly: { backgroundColor: colors.paper, borderColor: colors.line },
  inputError: { borderColor: colors.short, borderWidth: 2 },
  hint: { ...type.small, color: colors.inkSoft },
  error: { ...type.small, color: colors.short, fontFamily: 'Nunito_700Bold' },
});


/** Whether a Pressable has keyboard focus (react-native-web adds `focused` to the state it passes). */
export const isFocused = (state: object) => !!(state as { focused?: boolean }).focused;

export type KeyEvent = { key: string; preventDefault: () => void };
/** A key handler for a Pressable on the web (react-native-web passes onKeyDown through; its types do not list it). */
export const onKeys = (handler: (e: KeyEvent) => void) => ({ onKeyDown: handler }) as object;
