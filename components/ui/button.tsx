import { ActivityIndicator, Pressable, StyleSheet, type PressableProps } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Text } from './text';
import { useAppIsLive } from './use-app-is-live';

type Tone = 'primary' | 'secondary' | 'danger' | 'quiet';

export type ButtonProps = Omit<PressableProps, 'children'> & {
  label: string;
  tone?: Tone;
  busy?: boolean;
  testID: string;
};

const toneStyles: Record<Tone, { bg: string; fg: 'white' | 'pine' | 'ember' | 'ink'; border: string }> = {
  primary: { bg: colors.pine, fg: 'white', border: colors.pine },
  secondary: { bg: colors.card, fg: 'pine', border: colors.pine },
  danger: { bg: colors.emberInk, fg: 'white', border: colors.emberInk },
  quiet: { bg: 'transparent', fg: 'ink', border: 'transparent' },
};

export function Button({ label, tone = 'primary', busy = false, disabled, style, ...rest }: ButtonProps) {
  const t = toneStyles[tone];
  const live = useAppIsLive();
  const inactive = disabled || busy || !live;
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel={rest.accessibilityLabel ?? label}
      accessibilityState={{ disabled: !!inactive, busy }}
      disabled={inactive}
      style={(state) => [
        styles.base,
        { backgroundColor: t.bg, borderColor: t.border, opacity: inactive ? 0.55 : state.pressed ? 0.85 : 1 },
        typeof style === 'function' ? style(state) : style,
      ]}
      {...rest}
    >
      {busy ? <ActivityIndicator color={t.fg === 'white' ? colors.white : colors.pine} /> : null}
      <Text variant="label" color={t.fg}>
        {label}
      </Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: 48,
    paddingHorizontal: space.xl,
    borderRadius: radii.pill,
    borderWidth: 2,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'center',
    gap: space.sm,
  },
});
