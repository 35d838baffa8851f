import { useWindowDimensions } from 'react-native';

/** From this width the app shows a side navigation and panes side by side. */
export const WIDE_MIN_WIDTH = 1024;

/** The side navigation's width on a wide screen. */
export const SIDE_NAV_WIDTH = 240;

export function useIsWide(): boolean {
  return useWindowDimensions().width >= WIDE_MIN_WIDTH;
}
