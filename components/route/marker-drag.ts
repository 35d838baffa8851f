/** Below this many pixels of movement a press is a tap, not a drag. */
export const DRAG_SLOP_PX = 4;

export type MarkerDrag = {
  /** While dragging: how far the marker has moved, in pixels. */
  onDrag: (dx: number, dy: number) => void;
  /** Let go: where it ended up, relative to where it started. */
  onDrop: (dx: number, dy: number) => void;
};

/** Arrow keys on a focused marker: the keyboard's way to drag it. */
export type MarkerKeyHandler = (dx: number, dy: number) => void;
