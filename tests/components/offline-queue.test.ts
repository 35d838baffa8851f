import { dehydrate, hydrate, onlineManager, type QueryClient } from '@tanstack/react-query';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { withKeptCheckIns } from '@/components/check-ins/kept-check-ins';
import type { CheckInRecord } from '@/shared/schemas/check-in';
import { conflictCurrent } from '@/stores/queries/api-client';
import type { CheckInSave } from '@/stores/queries/check-ins';
import { queuedSaveKeys, resumeKeptSaves, shouldKeepMutation } from '@/stores/queries/offline-queue';
import { useToastStore } from '@/stores/toast-store';
import { createQueryClient } from '@/stores/queries/query-client';
import type { ScheduleSave } from '@/stores/queries/appliances';

type Sent = { method: string; url: string; body: unknown };

/**
 * A server stand-in: records what reaches it and when each answer left, in order, takes a moment over each request,
 * and answers 409 for the appliance named `staleId`.
 */
function fakeServer(staleId: string) {
  const sent: Sent[] = [];
  const log: string[] = [];
  const fetchStub = vi.fn(async (url: string, init: RequestInit) => {
    const body: unknown = init.body ? JSON.parse(String(init.body)) : undefined;
    sent.push({ method: init.method ?? 'GET', url, body });
    log.push(`sent ${url}`);
    await new Promise((resolve) => setTimeout(resolve, 20));
    log.push(`answered ${url}`);
    if (url.includes(staleId)) {
      const current = { id: staleId, version: 7, appliance: { name: 'Fan' } };
      return new Response(JSON.stringify({ error: { code: 'conflict', message: 'Changed meanwhile.' }, current }), {
        status: 409,
      });
    }
    return new Response(JSON.stringify({ id: 'saved', version: 2 }), { status: 200 });
  });
  return { sent, log, fetchStub };
}

const checkIn: CheckInSave = {
  tripId: 't1',
  checkInId: null,
  checkIn: { at: '2027-09-14T18:00:00+01:00', socPct: 68, note: 'Fan ran all night' },
};
const routine: ScheduleSave = { tripId: 't1', applianceId: 'fan', version: 3, schedule: { kind: 'always' } };

/** Starts a kept save the way a screen does, without waiting for it. */
function startSave<T>(client: QueryClient, key: readonly string[], variables: T) {
  const mutation = client.getMutationCache().build(client, { mutationKey: key });
  return mutation.execute(variables).catch(() => undefined);
}

describe('changes made offline', () => {
  beforeEach(() => onlineManager.setOnline(false));
  afterEach(() => {
    onlineManager.setOnline(true);
    vi.unstubAllGlobals();
  });

  it('when saves are made with no connection, a reload restores them and, back online, they reach the server in order', async () => {
    const { sent, log, fetchStub } = fakeServer('nothing-stale');
    vi.stubGlobal('fetch', fetchStub);
    const before = createQueryClient();
    void startSave(before, queuedSaveKeys.checkIn, checkIn);
    void startSave(before, queuedSaveKeys.applianceSchedule, routine);
    await vi.waitFor(() =>
      expect(
        before
          .getMutationCache()
          .getAll()
          .every((m) => m.state.isPaused),
      ).toBe(true),
    );
    expect(sent).toHaveLength(0);

    // What the persister writes to IndexedDB, read back into the client of the reloaded page.
    const saved = JSON.parse(JSON.stringify(dehydrate(before, { shouldDehydrateMutation: shouldKeepMutation })));
    expect(saved.mutations).toHaveLength(2);
    const after = createQueryClient();
    hydrate(after, saved);
    onlineManager.setOnline(true);
    resumeKeptSaves(after);
    await vi.waitFor(() => expect(log).toHaveLength(4));

    expect(sent.map((s) => `${s.method} ${s.url}`)).toEqual([
      'POST /api/trips/t1/check-ins',
      'PUT /api/trips/t1/appliances/fan/schedule',
    ]);
    // One after the other: the routine is sent only once the check-in was answered.
    expect(log).toEqual([
      'sent /api/trips/t1/check-ins',
      'answered /api/trips/t1/check-ins',
      'sent /api/trips/t1/appliances/fan/schedule',
      'answered /api/trips/t1/appliances/fan/schedule',
    ]);
    expect(sent[0]?.body).toEqual({ checkIn: checkIn.checkIn });
    expect(sent[1]?.body).toEqual({ version: 3, schedule: { kind: 'always' } });
  });

  it('when a replayed save meets a newer version, then it waits with what was typed and the record as it now stands', async () => {
    const { fetchStub } = fakeServer('fan');
    vi.stubGlobal('fetch', fetchStub);
    const client = createQueryClient();
    void startSave(client, queuedSaveKeys.applianceSchedule, routine);
    onlineManager.setOnline(true);
    await vi.waitFor(() => expect(client.getMutationCache().getAll()[0]?.state.status).toBe('error'));
    const refused = client.getMutationCache().getAll()[0];
    expect(refused?.state.variables).toEqual(routine);
    expect(conflictCurrent<{ version: number }>(refused?.state.error)?.version).toBe(7);
  });

  it('when another change is made offline (not one that is kept), then it is refused at once rather than left spinning', async () => {
    const { sent, fetchStub } = fakeServer('nothing-stale');
    vi.stubGlobal('fetch', fetchStub);
    const client = createQueryClient();
    const mutation = client.getMutationCache().build(client, { mutationFn: () => fetch('/api/x', {}) });
    void mutation.execute(undefined);
    await vi.waitFor(() => expect(sent).toHaveLength(1));
    expect(shouldKeepMutation(mutation)).toBe(false);
  });
});

describe('a kept save refused on its way out', () => {
  afterEach(() => {
    onlineManager.setOnline(true);
    vi.unstubAllGlobals();
  });

  it('when the server refuses a restored save for another reason than a conflict, then a toast says so', async () => {
    onlineManager.setOnline(false);
    vi.stubGlobal(
      'fetch',
      vi.fn(
        async () =>
          new Response(
            JSON.stringify({ error: { code: 'unprocessable', message: 'A check-in must fall within the trip.' } }),
            {
              status: 422,
            },
          ),
      ),
    );
    const before = createQueryClient();
    void startSave(before, queuedSaveKeys.checkIn, checkIn);
    await vi.waitFor(() => expect(before.getMutationCache().getAll()[0]?.state.isPaused).toBe(true));
    const after = createQueryClient();
    hydrate(after, JSON.parse(JSON.stringify(dehydrate(before, { shouldDehydrateMutation: shouldKeepMutation }))));
    onlineManager.setOnline(true);
    resumeKeptSaves(after);
    await vi.waitFor(() =>
      expect(useToastStore.getState().toasts.map((t) => t.message)).toContain(
        'A change kept while offline was not saved: A check-in must fall within the trip.',
      ),
    );
  });
});

describe('readings waiting to sync', () => {
  const record = (id: string, at: string, socPct: number): CheckInRecord => ({
    id,
    version: 1,
    authorId: 'u1',
    authorName: 'Ana',
    createdAt: at,
    checkIn: { at, socPct, propane: [], harvestWh: null, note: '' },
  });
  const morning = record('c1', '2027-09-14T08:00:00Z', 79);

  it('when a new reading is kept, then it joins the list in time order and the latest is the kept one', () => {
    const merged = withKeptCheckIns([morning], [checkIn], 't1', 'You');
    expect(merged.map((c) => [c.id, c.checkIn.socPct])).toEqual([
      ['c1', 79],
      ['kept-0', 68],
    ]);
  });

  it('when a change to a reading is kept, then the reading shows the change; other trips are left out', () => {
    const change: CheckInSave = { tripId: 't1', checkInId: 'c1', version: 1, checkIn: { socPct: 75 } };
    const elsewhere: CheckInSave = { ...checkIn, tripId: 't2' };
    const merged = withKeptCheckIns([morning], [change, elsewhere], 't1', 'You');
    expect(merged).toHaveLength(1);
    expect(merged[0]?.checkIn.socPct).toBe(75);
    expect(merged[0]?.checkIn.at).toBe(morning.checkIn.at);
  });
});
