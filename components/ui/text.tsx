import { Text as RNText, type TextProps as RNTextProps } from 'react-native';
import { colors, typeScale, type ColorName, type TypeVariant } from '@/components/theme/tokens';

export type TextProps = RNTextProps & { variant?: TypeVariant; color?: ColorName };

// Text in ember or lake is drawn in their darker shades so it stays readable (WCAG AA) at any size.
const TEXT_COLORS: Record<ColorName, string> = { ...colors, ember: colors.emberInk, lake: colors.lakeInk };

export function Text({ variant = 'body', color = 'ink', style, ...rest }: TextProps) {
  return <RNText {...rest} style={[typeScale[variant], { color: TEXT_COLORS[color] }, style]} />;
}
