import { useEffect, useRef, type RefObject } from 'react';
import type { View } from 'react-native';
// Not from './use-marker-drag': on the web that name resolves to this very file.
import { DRAG_SLOP_PX, type MarkerDrag } from './marker-drag';

/**
 * On the web a marker is dragged with pointer events (mouse, pen or touch), captured by the marker so the drag
 * keeps going outside it. A drag does not also count as a press: the click that ends it is swallowed.
 */
export function useMarkerDrag(ref: RefObject<View | null>, drag: MarkerDrag | undefined): object {
  const latest = useRef(drag);
  useEffect(() => {
    latest.current = drag;
  }, [drag]);
  const enabled = drag !== undefined;
  useEffect(() => {
    // On the web a View's ref is its DOM element.
    const element = ref.current as unknown as HTMLElement | null;
    if (!element || !enabled) return;
    element.style.touchAction = 'none';
    let start: { x: number; y: number; pointer: number } | null = null;
    let moved = false;
    let swallowClick = false;
    const offset = (event: PointerEvent) => [event.clientX - (start?.x ?? 0), event.clientY - (start?.y ?? 0)] as const;
    const down = (event: PointerEvent) => {
      if (event.button !== 0) return;
      start = { x: event.clientX, y: event.clientY, pointer: event.pointerId };
      moved = false;
      element.setPointerCapture(event.pointerId);
    };
    const move = (event: PointerEvent) => {
      if (!start || event.pointerId !== start.pointer) return;
      const [dx, dy] = offset(event);
      if (!moved && Math.abs(dx) + Math.abs(dy) <= DRAG_SLOP_PX) return;
      moved = true;
      event.preventDefault();
      latest.current?.onDrag(dx, dy);
    };
    const up = (event: PointerEvent) => {
      if (!start || event.pointerId !== start.pointer) return;
      const [dx, dy] = offset(event);
      start = null;
      if (!moved) return;
      swallowClick = true;
      latest.current?.onDrop(dx, dy);
    };
    const cancel = () => {
      if (start && moved) latest.current?.onDrag(0, 0);
      start = null;
    };
    const click = (event: MouseEvent) => {
      if (!swallowClick) return;
      swallowClick = false;
      event.stopPropagation();
      event.preventDefault();
    };
    element.addEventListener('pointerdown', down);
    element.addEventListener('pointermove', move);
    element.addEventListener('pointerup', up);
    element.addEventListener('pointercancel', cancel);
    element.addEventListener('click', click);
    return () => {
      element.removeEventListener('pointerdown', down);
      element.removeEventListener('pointermove', move);
      element.removeEventListener('pointerup', up);
      element.removeEventListener('pointercancel', cancel);
      element.removeEventListener('click', click);
    };
  }, [ref, enabled]);
  return {};
}
