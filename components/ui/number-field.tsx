import { useState } from 'react';
import { TextField, type TextFieldProps } from './text-field';

type Props = Omit<TextFieldProps, 'value' | 'onChangeText'> & {
  value: number | null | undefined;
  onChangeNumber: (v: number | null) => void;
  unit?: string;
};

/**
 * A number typed as text: the field keeps exactly what the person typed (a half-typed "1." stays), while the
 * form receives a number, or null while the text is not one yet (the schema then says why).
 */
export function NumberField({ value, onChangeNumber, unit, label, ...rest }: Props) {
  const [text, setText] = useState(value === null || value === undefined ? '' : String(value));
  const shown =
    Number(text) === value || (text === '' && (value === null || value === undefined))
      ? text
      : value === null || value === undefined
        ? ''
        : String(value);
  return (
    <TextField
      {...rest}
      label={unit ? `${label} (${unit})` : label}
      inputMode="decimal"
      value={shown}
      onChangeText={(t) => {
        setText(t);
        const n = Number(t.replace(',', '.'));
        onChangeNumber(t.trim() === '' || !Number.isFinite(n) ? null : n);
      }}
    />
  );
}
