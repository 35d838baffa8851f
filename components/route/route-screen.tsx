import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { localMoment } from '@/components/format/time';
import { temperature } from '@/components/format/units';
import { useIsWide } from '@/components/theme/breakpoints';
import { colors, space } from '@/components/theme/tokens';
import { Panes, TabScroll } from '@/components/trip/tab-scroll';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { Text } from '@/components/ui/text';
import type { StopRecord, TripDetail } from '@/shared/schemas/api';
import { can } from '@/shared/schemas/roles';
import type { SiteExposure } from '@/shared/schemas/trip';
import { ApiError } from '@/stores/queries/api-client';
import { useStopDeleteMutation, useStopsReorderMutation } from '@/stores/queries/route';
import { showToast } from '@/stores/toast-store';
import { useUnits } from '@/stores/units-store';
import { useTripWeatherQuery } from '@/stores/queries/weather';
import { stopSkyText } from '@/components/budget/plan-chance-text';
import { DriveRow } from './drive-row';
import { nextStopTimes } from './next-stop-times';
import { RouteMapCard } from './route-map-card';
import { StopForm } from './stop-form';
import { TripExportsCard } from './trip-exports-card';
import { SunPath } from './sun-path';

const EXPOSURE: Record<string, string> = {
  open: 'open sky',
  'light-cover': 'light tree cover',
  'partial-shade': 'partial shade',
  'deep-forest': 'deep forest',
};
function exposureText(e: SiteExposure): string {
  if (e.kind === 'preset') return EXPOSURE[e.preset] ?? e.preset;
  if (e.kind === 'canopy') return `sky ${e.skyOpennessPct} % open${e.deciduous ? ', leaves fall in winter' : ''}`;
  return 'custom horizon';
}
const SKY: Record<string, string> = {
  clear: 'clear',
  hazy: 'hazy or smoke',
  'broken-cloud': 'broken cloud',
  overcast: 'overcast',
};

type Editing = { kind: 'stop'; id: string } | { kind: 'new' } | null;

export function RouteScreen({ detail, initialStopId }: { detail: TripDetail; initialStopId?: string }) {
  const wide = useIsWide();
  const units = useUnits();
  const weather = useTripWeatherQuery(detail.trip.id);
  const canEdit = can(detail.trip.role, 'editTrip');
  const [editing, setEditing] = useState<Editing>(initialStopId ? { kind: 'stop', id: initialStopId } : null);
  const [confirmRemove, setConfirmRemove] = useState(false);
  const reorder = useStopsReorderMutation(detail.trip.id);
  const remove = useStopDeleteMutation(detail.trip.id);
  const current = editing?.kind === 'stop' ? detail.stops.find((s) => s.id === editing.id) : undefined;

  const move = async (index: number, by: -1 | 1) => {
    const ids = detail.stops.map((s) => s.id);
    const [moved] = ids.splice(index, 1);
    if (moved === undefined) return;
    ids.splice(index + by, 0, moved);
    try {
      await reorder.mutateAsync({ tripVersion: detail.trip.version, stopIds: ids });
      showToast('Route order saved');
    } catch (error) {
      showToast(error instanceof ApiError ? error.message : 'The order could not be saved.', { tone: 'danger' });
    }
  };

  const stopCard = (record: StopRecord, i: number) => {
    const s = record.stop;
    return (
      <Card key={record.id} testID={`stop-${i}`} style={current?.id === record.id ? styles.selected : null}>
        <View style={styles.stopHead}>
          <View style={styles.badge}>
            <Text variant="label" color="white">
              {i + 1}
            </Text>
          </View>
          <Text variant="title" style={styles.stopName}>
            {s.name}
          </Text>
        </View>
        <Text variant="caption" color="inkSoft">
          {localMoment(s.arriveAt)} → {localMoment(s.departAt)}
        </Text>
        <Text>
          {exposureText(s.exposure)} · {SKY[s.skyOutlook]} ·{' '}
          {s.hookup ? `hookup ${s.hookup.amps} A ${s.hookup.volts} V` : 'no hookup'} ·{' '}
          {temperature(s.lowC, units).value}–{temperature(s.highC, units).value} {temperature(0, units).unit}
        </Text>
        <Text variant="caption" color="inkSoft" testID={`stop-${i}-sky`}>
          {stopSkyText(
            weather.data?.stops.find((w) => w.stopId === record.id),
            {
              source: s.skySource,
              presetName: (SKY[s.skyOutlook] ?? s.skyOutlook).toLowerCase(),
              ownTemperatures: s.ownTemperatures,
            },
          )}
        </Text>
        {canEdit ? (
          <View style={styles.actions}>
            <Button
              testID={`stop-${i}-edit`}
              tone="secondary"
              label="Edit"
              accessibilityLabel={`Edit ${s.name}`}
              onPress={() => setEditing({ kind: 'stop', id: record.id })}
            />
            <Button
              testID={`stop-${i}-up`}
              tone="quiet"
              label="↑ Earlier"
              accessibilityLabel={`Move ${s.name} earlier`}
              disabled={i === 0 || reorder.isPending}
              onPress={() => void move(i, -1)}
            />
            <Button
              testID={`stop-${i}-down`}
              tone="quiet"
              label="↓ Later"
              accessibilityLabel={`Move ${s.name} later`}
              disabled={i === detail.stops.length - 1 || reorder.isPending}
              onPress={() => void move(i, 1)}
            />
          </View>
        ) : (
          <Button
            testID={`stop-${i}-view`}
            tone="quiet"
            label="Sun path"
            accessibilityLabel={`Show the sun path at ${s.name}`}
            onPress={() => setEditing({ kind: 'stop', id: record.id })}
          />
        )}
      </Card>
    );
  };

  // Above the list and, on a phone, above the stop being edited too: a pin is placed while its stop is open.
  const map = (
    <RouteMapCard
      detail={detail}
      canEdit={canEdit}
      selectedStopId={current?.id ?? null}
      onOpenStop={(id) => setEditing({ kind: 'stop', id })}
    />
  );
  const list = (
    <View style={styles.column}>
      {wide ? map : null}
      {!canEdit ? (
        <Banner testID="route-read-only" tone="info" message="Only the trip owner or a planner can change the route." />
      ) : null}
      {detail.stops.length === 0 ? (
        <EmptyState
          testID="route-empty"
          title="No stops yet"
          body="Add the first place you will stay by its name (or its coordinates), or import a GPX file from your navigation app below."
        />
      ) : null}
      {detail.stops.map((record, i) => {
        const drive = detail.drives[i];
        return (
          <View key={record.id} style={styles.column}>
            {stopCard(record, i)}
            {drive && i < detail.stops.length - 1 ? (
              <DriveRow tripId={detail.trip.id} record={drive} index={i} canEdit={canEdit} />
            ) : null}
          </View>
        );
      })}
      {canEdit ? <Button testID="stop-add" label="Add a stop" onPress={() => setEditing({ kind: 'new' })} /> : null}
      <TripExportsCard detail={detail} />
    </View>
  );

  const editor =
    editing === null ? (
      wide ? (
        <Card testID="stop-editor-empty">
          <Text color="inkSoft">Choose a stop to edit it and see its sun path.</Text>
        </Card>
      ) : null
    ) : (
      <Card testID="stop-editor">
        <Text variant="title" role="heading" aria-level={2}>
          {current ? current.stop.name : 'New stop'}
        </Text>
        {current ? <SunPath stop={current.stop} testID="sun-path" /> : null}
        {canEdit ? (
          <StopForm
            key={current ? `form-${current.id}` : 'form-new'}
            tripId={detail.trip.id}
            record={current ?? null}
            fallbackZone={detail.trip.timeZone}
            newStopTimes={nextStopTimes(
              detail.trip,
              detail.stops.map((r) => r.stop),
            )}
            onDone={() => setEditing(null)}
          />
        ) : (
          <Button testID="stop-close" tone="quiet" label="Close" onPress={() => setEditing(null)} />
        )}
        {current && canEdit && !confirmRemove ? (
          <Button testID="stop-delete" tone="quiet" label="Remove stop…" onPress={() => setConfirmRemove(true)} />
        ) : null}
        {current && canEdit && confirmRemove ? (
          <View style={styles.actions}>
            <Text variant="label" color="ember">
              Remove {current.stop.name} and its drive from the route?
            </Text>
            <Button
              testID="stop-delete-confirm"
              tone="danger"
              label="Remove"
              busy={remove.isPending}
              onPress={async () => {
                try {
                  await remove.mutateAsync(current.id);
                  showToast(`${current.stop.name} removed`);
                  setEditing(null);
                } catch (error) {
                  showToast(error instanceof ApiError ? error.message : 'The stop could not be removed.', {
                    tone: 'danger',
                  });
                }
                setConfirmRemove(false);
              }}
            />
            <Button testID="stop-delete-cancel" tone="quiet" label="Keep it" onPress={() => setConfirmRemove(false)} />
          </View>
        ) : null}
      </Card>
    );

  return (
    <TabScroll testID="route-screen">
      {wide ? (
        <Panes main={list} side={editor} sideWidth={560} />
      ) : (
        <View style={styles.column}>
          {editing?.kind === 'stop' || !editing ? map : null}
          {editing ? editor : list}
        </View>
      )}
    </TabScroll>
  );
}

const styles = StyleSheet.create({
  column: { gap: space.md },
  selected: { borderColor: colors.pine, borderWidth: 2 },
  stopHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  stopName: { flex: 1 },
  badge: {
    width: 32,
    height: 32,
    borderRadius: 16,
    backgroundColor: colors.lake,
    alignItems: 'center',
    justifyContent: 'center',
  },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
