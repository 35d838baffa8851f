import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Text } from './text';

// Safety wording shown beside the settings it concerns. It defers to local codes and installers on purpose.
export const CAUTIONS = {
  generator:
    'Generators make carbon monoxide: never run one inside, under an awning, or near an open window or vent, and keep a working CO alarm.',
  propane:
    'Propane: check for leaks, ventilate, fit an LPG alarm, keep cylinders upright and secured, and never cook with an open flame inside without ventilation.',
  lithiumCold:
    'Lithium batteries must not be charged below 0 °C. Lead-acid batteries vent hydrogen while charging: ventilate their compartment.',
  cabling:
    'DC cables at 12 V carry hundreds of amps: size conductors and fuses by the applicable code (for example NFPA 70 / the NEC, ABYC E-11 for boats, or your local RV/caravan electrical standard) and have a qualified installer check the work.',
} as const;

export type CautionKind = keyof typeof CAUTIONS;

/** Each caution's rule in a few words: always on screen, so a folded caution still says what matters most. */
export const CAUTION_TITLES: Record<CautionKind, string> = {
  generator: 'Generators make carbon monoxide',
  propane: 'Propane: leak checks, ventilation, an LPG alarm',
  lithiumCold: 'Batteries: no lithium charging below 0 °C',
  cabling: 'DC cables carry hundreds of amps: size them by code',
};

/** One caution: its rule always shown, the full wording one tap away. */
export function Caution({ kind, testID, open = false }: { kind: CautionKind; testID?: string; open?: boolean }) {
  const id = testID ?? `caution-${kind}`;
  const [expanded, setExpanded] = useState(open);
  return (
    <View testID={id} style={styles.caution}>
      <Pressable
        testID={`${id}-toggle`}
        accessibilityRole="button"
        accessibilityLabel={`${CAUTION_TITLES[kind]}: ${expanded ? 'hide' : 'show'} the details`}
        aria-expanded={expanded}
        onPress={() => setExpanded((e) => !e)}
        style={styles.head}
      >
        <View style={styles.mark}>
          <Text variant="caption" color="white">
            !
          </Text>
        </View>
        <Text variant="label" color="lake" style={styles.title}>
          {CAUTION_TITLES[kind]}
        </Text>
        <Text variant="label" color="lake">
          {expanded ? '▾' : '▸'}
        </Text>
      </Pressable>
      {expanded ? (
        <Text color="ink" style={styles.body} testID={`${id}-text`}>
          {CAUTIONS[kind]}
        </Text>
      ) : null}
    </View>
  );
}

/** Several cautions in one place, each folded to its rule, instead of a stack of boxes. */
export function CautionArea({ kinds, testID }: { kinds: CautionKind[]; testID: string }) {
  if (kinds.length === 0) return null;
  return (
    <View testID={testID} style={styles.area} role="group" aria-label="Safety">
      <Text variant="label">Safety</Text>
      {kinds.map((k) => (
        <Caution key={k} kind={k} />
      ))}
      <Text variant="caption" color="inkSoft">
        Follow your local codes and have a licensed installer check the work.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  area: {
    gap: space.sm,
    padding: space.lg,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.card,
  },
  caution: {
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.lake,
    backgroundColor: colors.infoSoft,
    overflow: 'hidden',
  },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm, minHeight: 44, paddingHorizontal: space.md },
  mark: {
    width: 20,
    height: 20,
    borderRadius: 10,
    backgroundColor: colors.lakeInk,
    alignItems: 'center',
    justifyContent: 'center',
  },
  title: { flex: 1, paddingVertical: space.sm },
  body: { paddingHorizontal: space.md, paddingBottom: space.md },
});
