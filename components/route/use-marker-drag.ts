import { useMemo, type RefObject } from 'react';
import { PanResponder, type GestureResponderHandlers, type View } from 'react-native';
import { DRAG_SLOP_PX, type MarkerDrag } from './marker-drag';

/**
 * Native builds drag with the responder system: the wrapper claims the gesture from the marker's button once it
 * moves, so a tap still opens the stop. The web build uses pointer events instead (use-marker-drag.web.ts).
 */
export function useMarkerDrag(
  _ref: RefObject<View | null>,
  drag: MarkerDrag | undefined,
): GestureResponderHandlers | object {
  return useMemo(
    () =>
      drag
        ? PanResponder.create({
            onMoveShouldSetPanResponderCapture: (_e, g) => Math.abs(g.dx) + Math.abs(g.dy) > DRAG_SLOP_PX,
            onPanResponderMove: (_e, g) => drag.onDrag(g.dx, g.dy),
            onPanResponderRelease: (_e, g) => drag.onDrop(g.dx, g.dy),
            onPanResponderTerminate: () => drag.onDrag(0, 0),
          }).panHandlers
        : {},
    [drag],
  );
}
