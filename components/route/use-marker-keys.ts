import type { RefObject } from 'react';
import type { View } from 'react-native';
import type { MarkerKeyHandler } from './marker-drag';

/** Arrow keys nudge a focused marker on the web (use-marker-keys.web.ts); native builds move pins by dragging. */
export function useMarkerKeys(_ref: RefObject<View | null>, _onNudge: MarkerKeyHandler | undefined): void {}
