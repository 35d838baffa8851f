import { useEffect, useEffectEvent, useRef, type RefObject } from 'react';
import { Platform, type TextInput } from 'react-native';
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
          <BoundTextField
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

type BoundProps = TextFieldProps & { value: string; onChangeText: (text: string) => void };

function BoundTextField(props: BoundProps) {
  const input = useRef<TextInput>(null);
  useKeepTextTypedBeforeLoad(input, props.value, props.onChangeText);
  return <TextField ref={input} {...props} />;
}

/**
 * On the web a signed-out page arrives already drawn, and a visitor may type into it before the app's script has
 * loaded. When the app takes the page over, the field's input element still holds that text while the form's value
 * is empty; the form adopts the text once, so the next render does not wipe it.
 */
function useKeepTextTypedBeforeLoad(
  input: RefObject<TextInput | null>,
  value: string,
  onChangeText: (text: string) => void,
): void {
  const adopt = useEffectEvent(() => {
    // react-native-web hands the input element itself to the ref.
    const typed = (input.current as unknown as { value?: unknown } | null)?.value;
    if (typeof typed === 'string' && typed !== '' && typed !== value) onChangeText(typed);
  });
  useEffect(() => {
    if (Platform.OS === 'web') adopt();
  }, []);
}
