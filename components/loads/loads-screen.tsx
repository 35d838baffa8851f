import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { energy, power, text } from '@/components/format/units';
import { useIsWide } from '@/components/theme/breakpoints';
import { colors, radii, space } from '@/components/theme/tokens';
import { Panes, TabScroll } from '@/components/trip/tab-scroll';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { Text } from '@/components/ui/text';
import type { ApplianceRecord, TripDetail } from '@/shared/schemas/api';
import type { ApplianceFields, Circuit } from '@/shared/schemas/appliance';
import { can } from '@/shared/schemas/roles';
import { useApplianceDeleteMutation } from '@/stores/queries/appliances';
import { showToast } from '@/stores/toast-store';
import { AddAppliance, BY_HAND } from './add-appliance';
import { ApplianceForm } from './appliance-form';
import { dailyEnergyWh } from './daily-energy';
import { ScheduleEditor } from './schedule-editor';

const CIRCUITS: { circuit: Circuit; title: string; note: string }[] = [
  { circuit: 'ac', title: 'AC', note: 'through the inverter, or the hookup when there is one' },
  { circuit: 'dc', title: 'DC', note: 'straight off the battery' },
  { circuit: 'fuel', title: 'Fuel', note: 'burns propane; only the fan and controls draw on the battery' },
];

type Editing = { kind: 'existing'; id: string } | { kind: 'new'; fields: ApplianceFields; key: number } | null;

function ApplianceRow({
  record,
  selected,
  onSelect,
}: {
  record: ApplianceRecord;
  selected: boolean;
  onSelect: () => void;
}) {
  const a = record.appliance;
  const wh = dailyEnergyWh(a);
  return (
    <Pressable
      testID={`appliance-${record.id}`}
      accessibilityRole="button"
      accessibilityLabel={`${a.name}, ${text(power(a.runningW))}${wh === null ? ', follows the temperature' : `, about ${text(energy(wh))} a day`}`}
      aria-current={selected ? 'true' : undefined}
      onPress={onSelect}
      style={[styles.row, selected ? styles.rowSelected : null]}
    >
      <View style={styles.rowText}>
        <Text variant="label">
          {a.quantity > 1 ? `${a.quantity} × ` : ''}
          {a.name}
        </Text>
        <Text variant="caption" color="inkSoft">
          {text(power(a.runningW))}
          {a.dutyCycle < 1 ? ` · ${Math.round(a.dutyCycle * 100)}% duty` : ''}
          {a.schedule.kind === 'thermostat'
            ? ` · ${a.schedule.mode} by temperature`
            : a.schedule.kind === 'always'
              ? ' · all the time'
              : ''}
        </Text>
      </View>
      <View style={styles.energy}>
        <Text variant="label" color={wh === null ? 'inkSoft' : 'ink'}>
          {wh === null ? 'varies' : energy(wh).value}
        </Text>
        {wh === null ? null : (
          <Text variant="caption" color="inkSoft">
            {energy(wh).unit}/day
          </Text>
        )}
      </View>
    </Pressable>
  );
}

export function LoadsScreen({ detail }: { detail: TripDetail }) {
  const wide = useIsWide();
  const canEdit = can(detail.trip.role, 'editLoads');
  const [editing, setEditing] = useState<Editing>(null);
  const [confirmRemove, setConfirmRemove] = useState(false);
  const remove = useApplianceDeleteMutation(detail.trip.id);
  const current = editing?.kind === 'existing' ? detail.appliances.find((a) => a.id === editing.id) : undefined;

  const list = (
    <View style={styles.column}>
      {!canEdit ? (
        <Banner
          testID="loads-read-only"
          tone="info"
          message="You can view this trip's loads; only crew, planners and the owner can change them."
        />
      ) : null}
      {detail.appliances.length === 0 ? (
        <EmptyState
          testID="loads-empty"
          title="No appliances yet"
          body="Add the lights, fridge, pump and whatever else runs off the battery; the budget needs them to say how long the charge lasts."
        />
      ) : null}
      {CIRCUITS.map(({ circuit, title, note }) => {
        const items = detail.appliances.filter((a) => a.appliance.circuit === circuit);
        if (items.length === 0) return null;
        const total = items.reduce((s, a) => s + (dailyEnergyWh(a.appliance) ?? 0), 0);
        return (
          <Card key={circuit} testID={`circuit-${circuit}`}>
            <View style={styles.groupHead}>
              <Text variant="title" role="heading" aria-level={2}>
                {title}
              </Text>
              <Text variant="label" color="inkSoft">
                ≈ {text(energy(total))}/day
              </Text>
            </View>
            <Text variant="caption" color="inkSoft">
              {note}
            </Text>
            {items.map((a) => (
              <ApplianceRow
                key={a.id}
                record={a}
                selected={current?.id === a.id}
                onSelect={() => setEditing({ kind: 'existing', id: a.id })}
              />
            ))}
          </Card>
        );
      })}
      {canEdit ? <AddAppliance onPick={(fields) => setEditing({ kind: 'new', fields, key: Date.now() })} /> : null}
    </View>
  );

  const editor =
    editing === null ? (
      wide ? (
        <Card testID="appliance-editor-empty">
          <Text color="inkSoft">Choose an appliance to see and change when it runs.</Text>
        </Card>
      ) : null
    ) : (
      <Card testID="appliance-editor">
        <View style={styles.groupHead}>
          <Text variant="title" role="heading" aria-level={2}>
            {current ? current.appliance.name : 'New appliance'}
          </Text>
          <Button testID="appliance-editor-close" tone="quiet" label="Close" onPress={() => setEditing(null)} />
        </View>
        <ApplianceForm
          key={current ? `form-${current.id}` : editing.kind === 'new' ? `new-${editing.key}` : 'form-none'}
          tripId={detail.trip.id}
          record={current ?? null}
          initial={
            current
              ? (({ id: _id, ...rest }) => rest)(current.appliance)
              : editing.kind === 'new'
                ? editing.fields
                : BY_HAND
          }
          canEdit={canEdit}
          onSaved={(saved) => setEditing({ kind: 'existing', id: saved.id })}
        />
        {current ? (
          <ScheduleEditor key={`schedule-${current.id}`} detail={detail} record={current} canEdit={canEdit} />
        ) : null}
        {current && canEdit && !confirmRemove ? (
          <Button
            testID="appliance-delete"
            tone="quiet"
            label="Remove appliance…"
            onPress={() => setConfirmRemove(true)}
          />
        ) : null}
        {current && canEdit && confirmRemove ? (
          <View style={styles.confirm}>
            <Text variant="label" color="ember">
              Remove {current.appliance.name} from this trip?
            </Text>
            <Button
              testID="appliance-delete-confirm"
              tone="danger"
              label="Remove"
              busy={remove.isPending}
              onPress={async () => {
                await remove.mutateAsync(current.id);
                showToast(`${current.appliance.name} removed`);
                setConfirmRemove(false);
                setEditing(null);
              }}
            />
            <Button
              testID="appliance-delete-cancel"
              tone="quiet"
              label="Keep it"
              onPress={() => setConfirmRemove(false)}
            />
          </View>
        ) : null}
      </Card>
    );

  return (
    <TabScroll testID="loads-screen">
      {wide ? <Panes main={list} side={editor} sideWidth={560} /> : editing ? editor : list}
    </TabScroll>
  );
}

const styles = StyleSheet.create({
  column: { gap: space.xl },
  groupHead: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.sm,
    flexWrap: 'wrap',
  },
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    minHeight: 56,
    paddingVertical: space.sm,
    paddingHorizontal: space.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.white,
  },
  rowSelected: { borderColor: colors.pine, backgroundColor: colors.pineSoft },
  rowText: { flex: 1, gap: 2 },
  energy: { alignItems: 'flex-end' },
  confirm: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
});
