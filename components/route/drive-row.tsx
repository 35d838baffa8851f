import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { duration } from '@/components/format/duration';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { NumberField } from '@/components/ui/number-field';
import { Text } from '@/components/ui/text';
import { distanceInUnits, speedInUnits } from '@/shared/geo/drive-estimate';
import type { DriveRecord } from '@/shared/schemas/api';
import type { Drive } from '@/shared/schemas/trip';
import { ApiError } from '@/stores/queries/api-client';
import { useDriveSaveMutation } from '@/stores/queries/route';
import { showToast } from '@/stores/toast-store';
import { useUnits } from '@/stores/units-store';
import { driveToForm, formToDrive, shownHours, type DriveFormValues } from './drive-form-values';

const SOURCE_WORDS: Record<NonNullable<Drive['distanceSource']>, string> = {
  'great-circle': 'straight line × road factor',
  track: 'measured along the GPX track',
  typed: 'as typed',
};

function summary(drive: Drive, units: 'metric' | 'us'): string {
  const parts: string[] = [];
  if (drive.distanceKm !== null && drive.distanceKm !== undefined) {
    const d = distanceInUnits(drive.distanceKm, units);
    parts.push(`${Math.round(d.value)} ${d.unit} (${SOURCE_WORDS[drive.distanceSource ?? 'great-circle']})`);
  }
  const speed = drive.averageSpeedKmh ? speedInUnits(drive.averageSpeedKmh, units) : null;
  parts.push(
    `${duration(drive.hoursOnRoad)} on the road` +
      (drive.hoursSource === 'suggested' && speed ? ` at ${Math.round(speed.value)} ${speed.unit}` : ''),
  );
  if (drive.vehicleCharging) parts.push('charging from the vehicle');
  return parts.join(' · ');
}

type Props = { tripId: string; record: DriveRecord; index: number; canEdit: boolean };

/** One drive: its distance, its time on the road (suggested from the distance unless typed) and vehicle charging. */
export function DriveRow({ tripId, record, index, canEdit }: Props) {
  const units = useUnits();
  const save = useDriveSaveMutation(tripId);
  const [open, setOpen] = useState(false);
  const initial = driveToForm(record.drive, units);
  const [values, setValues] = useState<DriveFormValues>(initial);
  const [changed, setChanged] = useState({ distance: false, hours: false, other: false });
  const hours = shownHours(record.drive, values, changed.hours, units);
  const dirty = changed.distance || changed.hours || changed.other;
  const distanceUnit = units === 'us' ? 'mi' : 'km';
  const speedUnit = units === 'us' ? 'mph' : 'km/h';

  const send = async (drive: Drive, done: string) => {
    try {
      await save.mutateAsync({ driveId: record.id, version: record.version, drive });
      showToast(done);
      setChanged({ distance: false, hours: false, other: false });
      setOpen(false);
    } catch (error) {
      showToast(error instanceof ApiError ? error.message : 'The drive could not be saved.', { tone: 'danger' });
    }
  };
  const edit = (key: keyof DriveFormValues, value: number | null) => {
    setValues({ ...values, [key]: value });
    setChanged({
      ...changed,
      distance: changed.distance || key === 'distance',
      hours: changed.hours || key === 'hours',
      other: changed.other || key === 'speed' || key === 'roadFactor',
    });
  };

  return (
    <View style={styles.drive} testID={`drive-${index}`}>
      <Text variant="label" color="lake" testID={`drive-${index}-summary`}>
        Drive {index + 1}: {summary(record.drive, units)}
      </Text>
      {canEdit && !open ? (
        <View style={styles.actions}>
          <Button
            testID={`drive-${index}-edit`}
            tone="quiet"
            label="Change the drive"
            accessibilityLabel={`Change drive ${index + 1}: distance, time and speed`}
            onPress={() => {
              setValues(initial);
              setOpen(true);
            }}
          />
          <Button
            testID={`drive-${index}-charging`}
            tone="quiet"
            label={record.drive.vehicleCharging ? 'Vehicle charging: on' : 'Vehicle charging: off'}
            accessibilityLabel={`Vehicle charging during drive ${index + 1}: ${record.drive.vehicleCharging ? 'on' : 'off'}. Press to switch.`}
            onPress={() =>
              void send({ ...record.drive, vehicleCharging: !record.drive.vehicleCharging }, 'Drive saved')
            }
          />
        </View>
      ) : null}
      {canEdit && open ? (
        <View style={styles.form}>
          <View style={styles.fields}>
            <View style={styles.field}>
              <NumberField
                testID={`drive-${index}-distance`}
                label="Distance"
                unit={distanceUnit}
                value={values.distance}
                onChangeNumber={(v) => edit('distance', v)}
              />
            </View>
            <View style={styles.field}>
              <NumberField
                testID={`drive-${index}-hours`}
                label="Hours on the road"
                value={hours}
                hint={changed.hours || record.drive.hoursSource !== 'suggested' ? 'as typed' : 'suggested'}
                onChangeNumber={(v) => edit('hours', v)}
              />
            </View>
            <View style={styles.field}>
              <NumberField
                testID={`drive-${index}-speed`}
                label="Average speed"
                unit={speedUnit}
                value={values.speed}
                onChangeNumber={(v) => edit('speed', v)}
              />
            </View>
            <View style={styles.field}>
              <NumberField
                testID={`drive-${index}-road-factor`}
                label="Road factor"
                hint="road ÷ straight line, 1.3 is usual"
                value={values.roadFactor}
                onChangeNumber={(v) => edit('roadFactor', v)}
              />
            </View>
          </View>
          <View style={styles.actions}>
            <Button
              testID={`drive-${index}-save`}
              label="Save the drive"
              disabled={!dirty}
              busy={save.isPending}
              onPress={() => void send(formToDrive(record.drive, { ...values, hours }, changed, units), 'Drive saved')}
            />
            {record.drive.hoursSource === 'typed' ? (
              <Button
                testID={`drive-${index}-use-suggestion`}
                tone="secondary"
                label="Time from the distance"
                accessibilityLabel={`Let drive ${index + 1}'s time follow its distance and speed`}
                onPress={() =>
                  void send(
                    { ...formToDrive(record.drive, values, changed, units), hoursSource: 'suggested' },
                    'Drive saved',
                  )
                }
              />
            ) : null}
            {record.drive.distanceSource !== 'great-circle' ? (
              <Button
                testID={`drive-${index}-straight-line`}
                tone="quiet"
                label="Distance from the stops"
                accessibilityLabel={`Work drive ${index + 1}'s distance out from its stops and the road factor`}
                onPress={() =>
                  void send(
                    {
                      ...formToDrive(record.drive, values, { ...changed, distance: false }, units),
                      distanceSource: 'great-circle',
                    },
                    'Drive saved',
                  )
                }
              />
            ) : null}
            <Button testID={`drive-${index}-cancel`} tone="quiet" label="Cancel" onPress={() => setOpen(false)} />
          </View>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  drive: {
    marginLeft: space.xl,
    paddingLeft: space.lg,
    borderLeftWidth: 3,
    borderLeftColor: colors.lake,
    borderStyle: 'dashed',
    gap: space.sm,
    paddingVertical: space.sm,
    borderRadius: radii.sm,
  },
  form: { gap: space.md },
  fields: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  field: { flexGrow: 1, flexBasis: 0, minWidth: 140 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.xs },
});
