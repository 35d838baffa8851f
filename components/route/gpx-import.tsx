import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { duration } from '@/components/format/duration';
import { localMoment } from '@/components/format/time';
import { colors, radii, space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { distanceInUnits } from '@/shared/geo/drive-estimate';
import type { TripDetail } from '@/shared/schemas/api';
import type { GpxPreview } from '@/shared/schemas/gpx';
import { ApiError } from '@/stores/queries/api-client';
import { useGpxImportMutation, useGpxPreviewMutation } from '@/stores/queries/trip-exports';
import { showToast } from '@/stores/toast-store';
import { useUnits } from '@/stores/units-store';
import { pickTextFile } from './file-transfer';

/** The server reads files up to this size (server/places/gpx-read.ts). */
const MAX_BYTES = 5 * 1024 * 1024;

function PreviewList({ preview }: { preview: GpxPreview }) {
  const units = useUnits();
  return (
    <View style={styles.list} role="list" aria-label="What the import will create" testID="gpx-preview-list">
      {preview.stops.map(({ stop }, i) => {
        const drive = preview.drives[i];
        const km = drive?.distanceKm;
        const d = km === null || km === undefined ? null : distanceInUnits(km, units);
        return (
          <View key={`${stop.name}-${i}`} role="listitem" style={styles.item}>
            <Text variant="label">
              {i + 1}. {stop.name}
            </Text>
            <Text variant="caption" color="inkSoft">
              {localMoment(stop.arriveAt)} → {localMoment(stop.departAt)} · {stop.timeZone}
            </Text>
            {drive && d ? (
              <Text variant="caption" color="lake" testID={`gpx-preview-drive-${i}`}>
                then {d.value.toFixed(1)} {d.unit}
                {drive.distanceSource === 'track' ? ' along the track' : ' (straight line × 1.3)'}, about{' '}
                {duration(drive.hoursOnRoad)} on the road
              </Text>
            ) : null}
          </View>
        );
      })}
    </View>
  );
}

/** "Import GPX": choose a file, see what it will create, then save it all at once (or nothing). */
export function GpxImport({ detail, onDone }: { detail: TripDetail; onDone?: () => void }) {
  const preview = useGpxPreviewMutation(detail.trip.id);
  const save = useGpxImportMutation(detail.trip.id);
  const [file, setFile] = useState<{ name: string; text: string } | null>(null);
  const [error, setError] = useState<string>();
  const shown = file ? preview.data : undefined;

  const choose = async () => {
    setError(undefined);
    const picked = await pickTextFile({
      accept: '.gpx,application/gpx+xml,application/xml,text/xml',
      maxBytes: MAX_BYTES,
      tooLarge: 'That file is over 5 MB. Export only this trip’s waypoints and track, or a simplified track.',
      testID: 'gpx-file-input',
    });
    if (!picked) return;
    if ('error' in picked) return setError(picked.error);
    setFile(picked);
    try {
      await preview.mutateAsync(picked.text);
    } catch (e) {
      setFile(null);
      setError(e instanceof ApiError ? e.message : 'The file could not be read.');
    }
  };

  const confirm = async () => {
    if (!file || !shown) return;
    try {
      await save.mutateAsync({ text: file.text, tripVersion: detail.trip.version, replace: shown.replaces > 0 });
      showToast(`${shown.stops.length} stops imported from ${file.name}`);
      setFile(null);
      preview.reset();
      onDone?.();
    } catch (e) {
      setError(e instanceof ApiError ? e.message : 'The import could not be saved; nothing was changed.');
    }
  };

  return (
    <View style={styles.wrap} testID="gpx-import">
      {error ? <Banner testID="gpx-import-error" message={error} /> : null}
      {!shown ? (
        <Button
          testID="gpx-import-choose"
          tone="secondary"
          label="Import GPX"
          accessibilityLabel="Import stops and drives from a GPX file"
          busy={preview.isPending}
          onPress={() => void choose()}
        />
      ) : (
        <View style={styles.preview} testID="gpx-preview">
          <Text variant="label">
            {file?.name}: {shown.stops.length} stops and {shown.drives.length} drives
            {shown.timing === 'from-file' ? ', at the times in the file' : ', spread over the trip’s nights'}
          </Text>
          <PreviewList preview={shown} />
          {shown.warnings.map((warning) => (
            <Text key={warning} variant="caption" color="ember">
              {warning}
            </Text>
          ))}
          {shown.replaces > 0 ? (
            <Text variant="label" color="ember">
              This replaces the {shown.replaces} {shown.replaces === 1 ? 'stop' : 'stops'} now on the route.
            </Text>
          ) : null}
          <View style={styles.actions}>
            <Button
              testID="gpx-import-confirm"
              tone={shown.replaces > 0 ? 'danger' : 'primary'}
              label={shown.replaces > 0 ? 'Replace the route' : 'Add these stops'}
              busy={save.isPending}
              onPress={() => void confirm()}
            />
            <Button
              testID="gpx-import-cancel"
              tone="quiet"
              label="Cancel"
              onPress={() => {
                setFile(null);
                preview.reset();
              }}
            />
          </View>
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  preview: { gap: space.sm, padding: space.md, borderRadius: radii.md, backgroundColor: colors.infoSoft },
  list: { gap: space.sm },
  item: { gap: 2 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
