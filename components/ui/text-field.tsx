import { forwardRef, useId } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { colors, fonts, radii, space } from '@/components/theme/tokens';
import { Text } from './text';

export type TextFieldProps = TextInputProps & {
  label: string;
  error?: string;
  hint?: string;
  testID: string;
};

export const TextField = forwardRef<TextInput, TextFieldProps>(function TextField(
  { label, error, hint, style, ...rest },
  ref,
) {
  const id = useId();
  // A field that cannot be changed reads as plain text: no box, nothing that invites a tap.
  const readOnly = rest.editable === false;
  const describedBy = error ? `${id}-error` : hint ? `${id}-hint` : undefined;
  return (
    <View style={styles.wrap}>
      <Text variant="label" nativeID={`${id}-label`}>
        {label}
      </Text>
      <TextInput
        ref={ref}
        accessibilityLabel={label}
        aria-labelledby={`${id}-label`}
        aria-describedby={describedBy}
        aria-invalid={!!error}
        aria-readonly={readOnly || undefined}
        placeholderTextColor={colors.mist}
        style={[styles.input, error ? styles.inputError : null, style, readOnly ? styles.readOnly : null]}
        {...rest}
      />
      {error ? (
        <Text variant="caption" color="ember" nativeID={`${id}-error`} accessibilityLiveRegion="polite" role="alert">
          {error}
        </Text>
      ) : hint ? (
        <Text variant="caption" color="inkSoft" nativeID={`${id}-hint`}>
          {hint}
        </Text>
      ) : null}
    </View>
  );
});

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  input: {
    minHeight: 48,
    borderWidth: 2,
    borderColor: colors.line,
    borderRadius: radii.md,
    paddingHorizontal: space.lg,
    backgroundColor: colors.white,
    color: colors.ink,
    fontFamily: fonts.regular,
    fontSize: 16,
  },
  inputError: { borderColor: colors.ember },
  readOnly: {
    minHeight: 28,
    borderWidth: 0,
    paddingHorizontal: 0,
    backgroundColor: 'transparent',
    fontFamily: fonts.semiBold,
  },
});
