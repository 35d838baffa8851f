import { StyleSheet, View } from 'react-native';
import { space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import type { BudgetResult } from '@/shared/budget-result';
import { assumedSkyText, chanceHeadline, chanceYears } from './plan-chance-text';

/** The Budget tab's lead: in how many past years the plan held, its median, bad and worst year, and assumed skies. */
export function PlanChance({ result, stopCount }: { result: BudgetResult; stopCount: number }) {
  // A budget computed before skies were reported has neither figure: it reads as every sky assumed.
  const chance = (result.chance as BudgetResult['chance'] | undefined) ?? null;
  const assumed = assumedSkyText(result.skies as BudgetResult['skies'] | undefined, stopCount);
  const holdsAll = chance !== null && chance.held === chance.years;
  return (
    <Card testID="plan-chance" style={styles.card}>
      {chance ? (
        <>
          <Text
            variant="title"
            role="heading"
            aria-level={2}
            color={holdsAll ? 'pine' : chance.held / chance.years >= 0.9 ? 'ink' : 'ember'}
            testID="plan-chance-headline"
          >
            {chanceHeadline(chance)}
          </Text>
          <View style={styles.years}>
            {chanceYears(chance).map((y) => (
              <View
                key={y.label}
                style={styles.year}
                accessible
                accessibilityLabel={`${y.label}, ${y.year}: lowest charge ${y.lowest}`}
              >
                <Text variant="caption" color="inkSoft">
                  {y.label} ({y.year})
                </Text>
                <Text variant="label">lowest charge {y.lowest}</Text>
              </View>
            ))}
          </View>
          <Text variant="caption" color="inkSoft">
            The trip was run in each recorded year's weather at its stops. The ledger, chart and flags show the median
            year; the chart's band spans 1 in 10 to 9 in 10 years.
          </Text>
        </>
      ) : (
        <Text variant="title" role="heading" aria-level={2} testID="plan-chance-headline">
          Chance it holds: not known yet
        </Text>
      )}
      {assumed ? (
        <Text testID="plan-chance-assumed" color={chance ? 'inkSoft' : 'ink'}>
          {assumed}: {chance ? 'their' : 'its'} preset outlook stands in until a weather record is in (see the Route
          tab).
        </Text>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.sm },
  years: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.xl, rowGap: space.sm },
  year: { minWidth: 140 },
});
