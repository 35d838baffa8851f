import type { LatLon } from '@/shared/geo/great-circle';
import type { ChargeTone } from '@/shared/route-charge';

export type MapStop = {
  id: string;
  name: string;
  lat: number;
  lon: number;
  lowestSocPct: number | null;
  tone: ChargeTone | null;
};

export type RouteMapProps = {
  stops: MapStop[];
  height: number;
  testID: string;
  /** What the map shows, for screen readers: "Route map of Highland loop". */
  label: string;
  /** Small maps (trip card, Budget tab): small markers, no scale bar, no credit line. */
  compact?: boolean;
  /** Tapping a marker (or Enter on it) opens its stop. */
  onOpenStop?: (stopId: string) => void;
  /** Dragging a marker, arrow keys on it, or a tap on the map while placing a pin propose a new position. */
  onMoveStop?: (stopId: string, to: LatLon) => void;
  /** The stop that a tap on the map moves; null when not placing a pin. */
  placingStopId?: string | null;
};
