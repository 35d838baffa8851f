// The visit's undo stack: fixes come off newest first, per trip, and a dropped entry leaves the rest in order.
import { beforeEach, describe, expect, it } from 'vitest';
import type { UndoFixRequest } from '@/shared/schemas/api';
import { dropUndo, latestUndo, pushUndo, useUndoStore } from '@/stores/undo-store';

const request = (version: number): UndoFixRequest =>
  ({ kind: 'rig', version, restore: { version: version - 1, rig: {} } }) as unknown as UndoFixRequest;

beforeEach(() => useUndoStore.setState({ byTrip: {} }));

describe('undo stack', () => {
  it('when three fixes are applied in a row, then each undo takes the latest one left', () => {
    pushUndo('t1', request(2), 'Battery +100 Ah');
    pushUndo('t1', request(3), 'Solar +100 W');
    pushUndo('t1', request(4), 'Hookup at Shore field (16 A at 230 V)');
    const order: string[] = [];
    for (let e = latestUndo('t1'); e; e = latestUndo('t1')) {
      order.push(e.summary);
      dropUndo('t1', e.id);
    }
    expect(order).toEqual(['Hookup at Shore field (16 A at 230 V)', 'Solar +100 W', 'Battery +100 Ah']);
  });

  it('when fixes are applied on two trips, then each trip undoes only its own', () => {
    pushUndo('t1', request(2), 'Battery +100 Ah');
    pushUndo('t2', request(5), 'Solar +100 W');
    expect(latestUndo('t1')?.summary).toBe('Battery +100 Ah');
    expect(latestUndo('t2')?.summary).toBe('Solar +100 W');
    expect(latestUndo('t3')).toBeUndefined();
  });
});
