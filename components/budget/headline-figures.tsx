import { StyleSheet } from 'react-native';
import { energy, fuelAmount, hours, mass, percent } from '@/components/format/units';
import { localMoment } from '@/components/format/time';
import { space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { Figure } from '@/components/ui/figure';
import type { Headline } from '@/shared/engine/result-types';
import type { UnitSystem } from '@/shared/units';

export function HeadlineFigures({ headline, units }: { headline: Headline; units: UnitSystem }) {
  const belowReserve = headline.lowestSocPct < headline.reservePct;
  const fuel = headline.generatorFuel;
  return (
    <Card testID="headline-figures" style={styles.card}>
      <Figure
        testID="figure-lowest"
        label="Lowest charge"
        figure={percent(headline.lowestSocPct)}
        note={`${localMoment(headline.lowestAtLocal)} · reserve ${Math.round(headline.reservePct)}%`}
        color={belowReserve ? 'ember' : 'pine'}
      />
      <Figure
        testID="figure-short"
        label="Energy short"
        figure={energy(headline.energyShortWh)}
        color={headline.energyShortWh > 0 ? 'ember' : 'ink'}
      />
      <Figure
        testID="figure-generator"
        label="Generator"
        figure={hours(headline.generatorHours)}
        note={
          fuel
            ? `${fuelAmount(fuel.amount, fuel.unit, units).value} ${fuelAmount(fuel.amount, fuel.unit, units).unit} ${fuel.fuel}`
            : 'no generator'
        }
      />
      <Figure
        testID="figure-propane"
        label="Propane left"
        figure={mass(headline.propaneLeftKg, units)}
        note={`of ${mass(headline.propaneStartKg, units).value} ${mass(headline.propaneStartKg, units).unit}`}
      />
      <Figure
        testID="figure-wasted"
        label="Solar wasted"
        figure={energy(headline.solarWastedWh)}
        note={`${energy(headline.solarUsedWh).value} ${energy(headline.solarUsedWh).unit} used`}
        color="ink"
      />
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.lg },
});
