import Svg, { Circle, Path } from 'react-native-svg';
import { colors } from '@/components/theme/tokens';

/** Trailtally's mark: a sun over a trail line. */
export function BrandMark({ size = 40 }: { size?: number }) {
  return (
    <Svg
      width={size}
      height={size}
      viewBox="0 0 40 40"
      accessibilityElementsHidden
      importantForAccessibility="no-hide-descendants"
    >
      <Circle cx="20" cy="20" r="19" fill={colors.pine} />
      <Circle cx="26" cy="14" r="5" fill={colors.sunlit} />
      <Path d="M6 30 C 14 22, 20 30, 34 22" stroke={colors.dune} strokeWidth="3" fill="none" strokeLinecap="round" />
    </Svg>
  );
}
