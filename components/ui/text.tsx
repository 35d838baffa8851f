import { Text as RNText, type TextProps as RNTextProps } from 'react-native';
import { colors, typeScale, type ColorName, type TypeVariant } from '@/components/theme/tokens';

export type TextProps = RNTextProps & { variant?: TypeVariant; color?: ColorName };

export function Text({ variant = 'body', color = 'ink', style, ...rest }: TextProps) {
  return <RNText {...rest} style={[typeScale[variant], { color: colors[color] }, style]} />;
}
