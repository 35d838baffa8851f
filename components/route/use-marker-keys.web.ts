import { useEffect, useRef, type RefObject } from 'react';
import type { View } from 'react-native';
import type { MarkerKeyHandler } from './marker-drag';

const STEP_PX = 4;
const BIG_STEP_PX = 24;

/** Arrow keys move a focused marker by a few pixels (Shift for bigger steps): the keyboard's way to drag. */
export function useMarkerKeys(ref: RefObject<View | null>, onNudge: MarkerKeyHandler | undefined): void {
  const latest = useRef(onNudge);
  useEffect(() => {
    latest.current = onNudge;
  }, [onNudge]);
  const enabled = onNudge !== undefined;
  useEffect(() => {
    // On the web a View's ref is its DOM element.
    const element = ref.current as unknown as HTMLElement | null;
    if (!element || !enabled) return;
    const listener = (event: KeyboardEvent) => {
      const step = event.shiftKey ? BIG_STEP_PX : STEP_PX;
      const moves: Record<string, [number, number]> = {
        ArrowUp: [0, -step],
        ArrowDown: [0, step],
        ArrowLeft: [-step, 0],
        ArrowRight: [step, 0],
      };
      const move = moves[event.key];
      if (!move) return;
      event.preventDefault();
      latest.current?.(move[0], move[1]);
    };
    element.addEventListener('keydown', listener);
    return () => element.removeEventListener('keydown', listener);
  }, [ref, enabled]);
}
