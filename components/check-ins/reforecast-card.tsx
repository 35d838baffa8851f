import { StyleSheet, View } from 'react-native';
import Svg, { Circle, Line, Path } from 'react-native-svg';
import { colors, space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import type { BudgetResult } from '@/shared/budget-result';
import type { CheckInRecord } from '@/shared/schemas/check-in';
import type { ReforecastState } from './use-reforecast';
import { reforecastChart, reforecastHeadline, type ChartPoint } from './reforecast-view';

const W = 600;
const H = 180;
const PAD = 6;

const xOf = (x: number, last: number) => PAD + (x / Math.max(1, last)) * (W - 2 * PAD);
const yOf = (soc: number) => PAD + (1 - soc / 100) * (H - 2 * PAD);

function linePath(points: readonly ChartPoint[], last: number): string {
  return points.map((p, i) => `${i === 0 ? 'M' : 'L'}${xOf(p.x, last).toFixed(1)},${yOf(p.soc).toFixed(1)}`).join('');
}

/** The forecast as a filled curve down to 0 %: state of charge is always drawn filled. */
function areaPath(points: readonly ChartPoint[], last: number): string {
  const first = points[0];
  const end = points[points.length - 1];
  if (!first || !end) return '';
  return `${linePath(points, last)}L${xOf(end.x, last).toFixed(1)},${yOf(0)}L${xOf(first.x, last).toFixed(1)},${yOf(0)}Z`;
}

type Props = { plan: BudgetResult; state: ReforecastState; checkIns: readonly CheckInRecord[] };

/** The plan as made, the readings as points and the forecast from the latest one, with its headline. */
export function ReforecastCard({ plan, state, checkIns }: Props) {
  if (state.state === 'none') return null;
  const re = state.state === 'ready' ? state.reforecast : undefined;
  const chart = reforecastChart(plan, re, checkIns);
  const headline = re
    ? reforecastHeadline(re)
    : 'Your latest check-in is after the trip ends: nothing is left to forecast.';
  return (
    <Card testID="reforecast-card">
      <Text variant="title" role="heading" aria-level={2}>
        On the road
      </Text>
      <Text variant="label" testID="reforecast-headline">
        {headline}
      </Text>
      <View
        accessible
        accessibilityRole="image"
        accessibilityLabel={`Chart: the plan as made, ${chart.readings.length} check-ins as points${re ? ', and the forecast from the latest' : ''}.`}
        testID="reforecast-chart"
      >
        <Svg width="100%" height={H} viewBox={`0 0 ${W} ${H}`} preserveAspectRatio="none">
          {re ? <Path d={areaPath(chart.ahead, chart.last)} fill={colors.pineSoft} /> : null}
          <Line
            x1={PAD}
            x2={W - PAD}
            y1={yOf(chart.reservePct)}
            y2={yOf(chart.reservePct)}
            stroke={colors.ember}
            strokeWidth={1.5}
            strokeDasharray="6 4"
          />
          <Path d={linePath(chart.plan, chart.last)} stroke={colors.mist} strokeWidth={2} fill="none" />
          {re ? (
            <Path d={linePath(chart.ahead, chart.last)} stroke={colors.pine} strokeWidth={2.5} fill="none" />
          ) : null}
          {chart.readings.map((r) => (
            <Circle
              key={r.id}
              cx={xOf(r.x, chart.last)}
              cy={yOf(r.soc)}
              r={5}
              fill={colors.ink}
              stroke={colors.white}
              strokeWidth={1.5}
            />
          ))}
        </Svg>
      </View>
      <View style={styles.legend}>
        <Text variant="caption" color="inkSoft">
          <Text variant="caption" color="mist">
            ━
          </Text>{' '}
          Plan as made{'   '}
          <Text variant="caption" color="pine">
            ━
          </Text>{' '}
          Forecast from your check-in{'   '}● Check-ins{'   '}
          <Text variant="caption" color="emberInk">
            ┅
          </Text>{' '}
          Reserve
        </Text>
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({ legend: { gap: space.xs } });
