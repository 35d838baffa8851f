import { Controller, type Control, type FieldValues, type Path } from 'react-hook-form';
import { FieldSlot } from './field-slot';
import { TextField, type TextFieldProps } from '@/components/ui/text-field';

type Props<T extends FieldValues> = Omit<TextFieldProps, 'value' | 'onChangeText' | 'onBlur' | 'error'> & {
  control: Control<T>;
  name: Path<T>;
};

/** A text field bound to a react-hook-form field: its value, its changes and its inline error. */
export function FormTextField<T extends FieldValues>({ control, name, ...props }: Props<T>) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <FieldSlot fieldRef={field.ref}>
          <TextField
            {...props}
            value={typeof field.value === 'string' ? field.value : ''}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error?.message}
          />
        </FieldSlot>
      )}
    />
  );
}
