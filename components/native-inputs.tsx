// Outside the web: plain text inputs with the same contract (the web build uses native-inputs.web.tsx).
import { TextInput } from 'react-native';

import { fieldStyles } from './form-frame';

export type NativeInputProps = {
  kind: 'time' | 'datetime';
  value: string;
  onChange: (value: string) => void;
  onBlur: () => void;
  labelledBy: string;
  describedBy?: string;
  invalid?: boolean;
  readOnly?: boolean;
  testID: string;
  inputRef?: (el: unknown) => void;
  onEnter?: () => void;
};
export type SelectInputProps = Omit<NativeInputProps, 'kind' | 'onEnter'> & { options: { value: string; label: string }[] };

export function NativeInput({ kind, value, onChange, onBlur, labelledBy, describedBy, invalid, readOnly, testID, inputRef, onEnter }: NativeInputProps) {
  return (
    <TextInput
      ref={inputRef as never}
      testID={testID}
      value={value}
      placeholder={kind === 'time' ? 'hh:mm' : 'yyyy-mm-dd hh:mm'}
      onChangeText={onChange}
      onBlur={onBlur}
      onSubmitEditing={onEnter}
      readOnly={readOnly}
      aria-labelledby={labelledBy}
      aria-describedby={describedBy}
      aria-invalid={invalid}
      style={[fieldStyles.input, invalid ? fieldStyles.inputError : null]}
    />
  );
}

export function SelectInput(props: SelectInputProps) {
  return <NativeInput {...props} kind="time" />;
}
