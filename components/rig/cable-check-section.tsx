// The cable check on the Rig tab: the rig's DC runs, each with the current it must carry, its voltage drop, the
// conductor's rating and the fuse that protects it, and a plain verdict. The runs are part of the rig record, so
// they are saved (and conflicts caught) with the rest of the rig form.
import { useState } from 'react';
import { Controller, useFieldArray, useWatch, type UseFormSetValue } from 'react-hook-form';
import { StyleSheet, View, type ViewStyle } from 'react-native';
import { colors, radii, space, type ColorName } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Caution } from '@/components/ui/cautions';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { Figure } from '@/components/ui/figure';
import { Text } from '@/components/ui/text';
import type { ConductorVerdict } from '@/shared/engine/cable-check';
import type { CableRig } from '@/shared/engine/cable-current';
import { newRun, RUN_NAMES, type DcLoad } from '@/shared/engine/dc-run-defaults';
import type { CheckedRun } from '@/shared/engine/dc-wiring-check';
import { DC_RUN_KINDS, MAX_DC_RUNS, type CableBasis, type DcRun, type DcRunKind } from '@/shared/schemas/dc-wiring';
import type { RigInput } from '@/shared/schemas/rig';
import type { UnitSystem } from '@/shared/units';
import { DcRunEditor } from './dc-run-editor';
import {
  ampsText,
  BASIS_NOTES,
  checkForm,
  DROP_LIMIT_TEXT,
  KIND_SHORT,
  lengthText,
  runVerdict,
  sizeWithEquivalent,
  unitFamily,
  type Verdict,
} from './dc-run-values';
import { Section, type RigControl } from './rig-fields';

type Props = {
  control: RigControl;
  setValue: UseFormSetValue<RigInput>;
  units: UnitSystem;
  disabled: boolean;
  /** The trip's DC loads, for suggested load circuits. */
  dcLoads: readonly DcLoad[];
};

const TONE: Record<Verdict['tone'], { text: ColorName; badge: ViewStyle }> = {
  pass: { text: 'pine', badge: { backgroundColor: colors.pineSoft, borderColor: colors.pine } },
  fail: { text: 'ember', badge: { backgroundColor: colors.emberSoft, borderColor: colors.ember } },
  unknown: { text: 'lake', badge: { backgroundColor: colors.infoSoft, borderColor: colors.lake } },
};

/** Whether the rig has the part a kind of run comes from (load circuits need no part). */
function rigHas(kind: DcRunKind, rig: CableRig): boolean {
  if (kind === 'battery-inverter') return rig.inverter !== null;
  if (kind === 'controller-battery') return rig.controller !== null;
  if (kind === 'array-controller') return rig.solarArrays.length > 0;
  if (kind === 'dc-dc-charger') return rig.vehicleCharger !== null;
  return true;
}

function protectionText(run: DcRun): string {
  return run.protection.kind === 'none' ? 'no fuse' : `${run.protection.kind} ${ampsText(run.protection.amps)}`;
}

/** The fuse ratings that suit the run: from 125 % of its current (on sale) up to what the conductor may have. */
function fuseRange(c: ConductorVerdict): { value: string; unit: string } {
  if (c.protectionA === null) return { value: '—', unit: '' };
  if (!c.protectionFits) return { value: `≥ ${c.protectionA}`, unit: 'A' };
  const max = Math.floor(c.maxProtectionA);
  return { value: max > c.protectionA ? `${c.protectionA}–${max}` : String(c.protectionA), unit: 'A' };
}

function split(text: string): { value: string; unit: string } {
  const at = text.lastIndexOf(' ');
  return { value: text.slice(0, at), unit: text.slice(at + 1) };
}

function RunSummary({
  checked,
  basis,
  units,
  testID,
}: {
  checked: CheckedRun;
  basis: CableBasis;
  units: UnitSystem;
  testID: string;
}) {
  const { run, check } = checked;
  const verdict = runVerdict(checked, basis, units);
  const tone = TONE[verdict.tone];
  return (
    <View style={styles.summary}>
      <View style={styles.runHead}>
        <Text variant="label" style={styles.runName} role="heading" aria-level={3}>
          {run.name}
        </Text>
        <View style={[styles.badge, tone.badge]} testID={`${testID}-headline`}>
          <Text variant="caption" color={tone.text}>
            {verdict.headline}
          </Text>
        </View>
      </View>
      <Text variant="caption" color="inkSoft">
        {[RUN_NAMES[run.kind], lengthText(run.lengthM, units), sizeWithEquivalent(run.size), protectionText(run)].join(
          ' · ',
        )}
      </Text>
      {check.known ? (
        <View style={styles.figures}>
          <Figure
            label="Must carry"
            figure={split(ampsText(check.current.continuousA))}
            style={styles.figure}
            testID={`${testID}-current`}
          />
          <Figure
            label="Voltage drop"
            figure={{ value: check.conductor.dropPct.toFixed(1), unit: '%' }}
            note={`limit ${check.dropLimitPct} %`}
            color={check.conductor.dropOk ? 'ink' : 'ember'}
            style={styles.figure}
            testID={`${testID}-drop`}
          />
          <Figure
            label="Cable good for"
            figure={split(ampsText(check.conductor.ampacityA))}
            color={check.conductor.carries ? 'ink' : 'ember'}
            style={styles.figure}
            testID={`${testID}-ampacity`}
          />
          <Figure
            label="Fuse between"
            figure={fuseRange(check.conductor)}
            note={
              check.conductor.protectionFits ? '125 % of the current, up to the cable' : 'more than the cable may have'
            }
            color={check.conductor.protectionFits ? 'ink' : 'ember'}
            style={styles.fuseFigure}
            testID={`${testID}-fuse`}
          />
        </View>
      ) : null}
      <View style={styles.lines} testID={`${testID}-verdict`}>
        {verdict.lines.map((line) => (
          <Text key={line} color={verdict.tone === 'fail' && line === verdict.lines[0] ? 'ember' : 'ink'}>
            {line}
          </Text>
        ))}
      </View>
    </View>
  );
}

export function CableCheckSection({ control, setValue, units, disabled, dcLoads }: Props) {
  const runs = useFieldArray({ control, name: 'dcWiring.runs' });
  const values = useWatch({ control });
  const check = checkForm(values, units, dcLoads);
  const [openId, setOpenId] = useState<string | null>(null);
  const family = unitFamily(units);

  const add = (kind: DcRunKind, rig: CableRig, basis: CableBasis, existing: DcRun[]) => {
    const load = kind === 'dc-load' ? { name: 'DC load circuit', runningW: 60 } : undefined;
    runs.append(newRun(kind, rig, basis, family, existing, load));
  };

  const entered = check.ready ? check.entered : [];
  const shown = check.ready ? (check.suggested ? check.suggestions : entered.filter((c) => c !== null)) : [];
  const passing = shown.filter((c) => c.check.known && c.check.passes).length;
  const failing = shown.filter((c) => c.check.known && !c.check.passes).length;

  return (
    <Section title="Cables and fuses" testID="rig-cable-check">
      <Text color="inkSoft">
        Each DC run: the current it must carry at worst, the voltage it loses, what the conductor is good for and the
        fuse that protects it.
      </Text>
      <Controller
        control={control}
        name="dcWiring.basis"
        render={({ field }) => (
          <ChoiceChips
            testID="cable-basis"
            label="Check against"
            disabled={disabled}
            value={field.value ?? 'abyc-e11'}
            onChange={field.onChange}
            options={[
              { value: 'abyc-e11', label: 'ABYC E-11' },
              { value: 'nfpa70', label: 'NFPA 70 (NEC)' },
            ]}
          />
        )}
      />
      <Text variant="caption" color="inkSoft" testID="cable-basis-note">
        {`${BASIS_NOTES[check.ready ? check.basis : 'abyc-e11']} ${DROP_LIMIT_TEXT}`}
      </Text>
      {!check.ready ? (
        <Banner
          testID="cable-check-waiting"
          tone="info"
          message="The battery and the parts above need their figures before the runs can be checked."
        />
      ) : null}
      {check.ready && shown.length > 0 ? (
        <View style={styles.figures} testID="cable-summary">
          <Figure
            label="Runs that pass"
            figure={{ value: String(passing), unit: `of ${shown.length}` }}
            color="pine"
            testID="cable-passing"
          />
          <Figure
            label="Runs to look at"
            figure={{ value: String(failing), unit: failing === 1 ? 'run' : 'runs' }}
            color={failing > 0 ? 'ember' : 'ink'}
            testID="cable-failing"
          />
        </View>
      ) : null}
      {check.ready && check.suggested ? (
        <View style={styles.list}>
          <Banner
            testID="cable-suggested"
            tone="info"
            message="No runs entered yet. These are suggested from the rig's parts at typical lengths: measure your own runs and correct them."
          />
          {check.suggestions.map((c, i) => (
            <View key={`${c.run.kind}-${c.run.name}`} style={styles.run} testID={`dc-suggested-${i}`}>
              <RunSummary checked={c} basis={check.basis} units={units} testID={`dc-suggested-${i}`} />
            </View>
          ))}
          {!disabled && check.suggestions.length > 0 ? (
            <Button
              testID="cable-use-suggested"
              tone="secondary"
              label="Start from these runs"
              onPress={() => runs.replace(check.suggestions.map((c) => c.run))}
            />
          ) : null}
        </View>
      ) : null}
      <View style={styles.list}>
        {runs.fields.map((f, i) => {
          const checked = entered[i] ?? null;
          const open = openId === f.id;
          return (
            <View key={f.id} style={styles.run} testID={`dc-run-${i}`}>
              {checked && check.ready ? (
                <RunSummary checked={checked} basis={check.basis} units={units} testID={`dc-run-${i}`} />
              ) : (
                <Text color="ember" testID={`dc-run-${i}-incomplete`}>
                  Some of this run’s figures need a look before it can be checked.
                </Text>
              )}
              {!disabled ? (
                <View style={styles.actions}>
                  <Button
                    testID={`dc-run-${i}-edit`}
                    tone="secondary"
                    label={open ? 'Done' : 'Edit run'}
                    accessibilityLabel={`${open ? 'Close' : 'Edit'} run ${i + 1}`}
                    aria-expanded={open}
                    onPress={() => setOpenId(open ? null : f.id)}
                  />
                  <Button
                    testID={`dc-run-${i}-remove`}
                    tone="quiet"
                    label="Remove"
                    accessibilityLabel={`Remove run ${i + 1}`}
                    onPress={() => runs.remove(i)}
                  />
                </View>
              ) : null}
              {open || (!checked && !disabled) ? (
                <DcRunEditor control={control} setValue={setValue} index={i} units={units} disabled={disabled} />
              ) : null}
            </View>
          );
        })}
      </View>
      {!disabled && check.ready && runs.fields.length < MAX_DC_RUNS ? (
        <View style={styles.addWrap}>
          <Text variant="label">Add a run</Text>
          <View style={styles.addRow}>
            {DC_RUN_KINDS.filter((k) => rigHas(k, check.rig)).map((kind) => (
              <Button
                key={kind}
                testID={`cable-add-${kind}`}
                tone="secondary"
                style={styles.addButton}
                label={`+ ${KIND_SHORT[kind]}`}
                accessibilityLabel={`Add a run: ${RUN_NAMES[kind]}`}
                onPress={() => {
                  add(
                    kind,
                    check.rig,
                    check.basis,
                    entered.flatMap((c) => (c ? [c.run] : [])),
                  );
                  setOpenId(null);
                }}
              />
            ))}
          </View>
        </View>
      ) : null}
      <Caution kind="cabling" testID="caution-cabling" />
      <Text variant="caption" color="inkSoft" testID="cable-defer">
        This check is for planning. The code that applies where the rig is built and registered, and a qualified
        installer who sees the work, have the last word on every conductor, fuse and terminal.
      </Text>
    </Section>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  run: {
    gap: space.sm,
    padding: space.lg,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.white,
  },
  summary: { gap: space.sm },
  runHead: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  runName: { flexGrow: 1, flexShrink: 1 },
  badge: {
    borderRadius: radii.pill,
    borderWidth: 1,
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
    flexShrink: 1,
  },
  figures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  lines: { gap: space.xs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  // Two figures to a phone row, four to a wide one.
  figure: { minWidth: 96, flexBasis: 96 },
  fuseFigure: { minWidth: 130, flexBasis: 130 },
  addWrap: { gap: space.sm },
  addRow: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  addButton: { paddingHorizontal: space.lg, minHeight: 44 },
});
