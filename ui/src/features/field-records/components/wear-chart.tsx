import { Paper, Text, Title } from '@mantine/core';
import { LineChart } from '@mantine/charts';
import { formatNumber, wearLineAt, type WearSeries } from '@holdfast/calc';
import { isoDay } from '../../../lib/dates';
import { chartDay as day, chartDayText as dateText, dateOf, mmPerMonth } from './wear-series';

/**
 * The wear rate to two significant figures and its standard error to one: readings are taken to
 * 0.1-0.5 mm, so further digits of either say nothing.
 */
const rateText = (rate: number, se: number) =>
  `${formatNumber(mmPerMonth(rate), 2)} ± ${formatNumber(mmPerMonth(se), 1)}`;
/** Axis ticks and tooltips in mm: at most two decimals, none that are only zeros (24, not 24.00). */
const mmText = (v: number) => String(Number(v.toFixed(2)));

/**
 * Readings of one length over time with the fitted line, the minimum, and the predicted date the
 * line reaches it with its 95 % prediction interval (calc's fitWearTrend).
 */
export function WearChart({
  title,
  series,
  work = 're-adjustment',
}: {
  title: string;
  series: WearSeries;
  /** What reaching the minimum calls for: 're-adjustment' (reserve stroke), 'lining change'. */
  work?: string;
}) {
  const { readings, fit, minimum } = series;
  const crossing = fit?.kind === 'trend' ? fit.crossing : undefined;
  const rows: { x: number; Measured?: number; Fitted?: number }[] = readings.map((r) => ({
    x: day(r.at),
    Measured: r.value * 1000,
  }));
  if (fit) {
    const first = readings[0]!.at;
    const last = crossing ? crossing.at : readings[readings.length - 1]!.at;
    for (const s of [first, last]) rows.push({ x: day(s), Fitted: wearLineAt(fit, s) * 1000 });
  }
  rows.sort((a, b) => a.x - b.x);
  type Line = { x?: number; y?: number; label: string; color: string; side?: 'left' | 'right' };
  const referenceLines: Line[] = [];
  if (minimum !== null)
    referenceLines.push({ y: minimum * 1000, label: 'minimum', color: 'fail.7' });
  if (crossing) {
    // The interval's two ends, labelled outwards so the labels never sit on each other (for a
    // vertical line recharts puts an insideTopRight label on the line's left side).
    referenceLines.push(
      { x: day(crossing.lower), label: 'from', color: 'amber.8', side: 'left' },
      { x: day(crossing.upper), label: 'to', color: 'amber.8', side: 'right' },
    );
  }
  // The axis reaches past the end of the prediction interval, with room for its label.
  const xFirst = rows[0]?.x ?? 0;
  const xLast = Math.max(rows[rows.length - 1]?.x ?? 0, crossing ? day(crossing.upper) : 0);
  const xPad = crossing ? Math.max(1, Math.round((xLast - xFirst) * 0.08)) : 0;
  return (
    <Paper p="sm" withBorder component="figure" m={0} aria-label={title}>
      <Title order={3} size="h5" mb="xs">
        {title}
      </Title>
      {readings.length > 0 && (
        <LineChart
          h={240}
          data={rows}
          dataKey="x"
          series={[
            { name: 'Measured', color: 'steel.7' },
            { name: 'Fitted', color: 'grape.6', strokeDasharray: '6 4' },
          ]}
          curveType="linear"
          connectNulls
          withLegend
          legendProps={{ verticalAlign: 'bottom', height: 40 }}
          yAxisLabel="mm"
          gridAxis="xy"
          valueFormatter={mmText}
          xAxisProps={{
            type: 'number',
            domain: [xFirst, xLast + xPad],
            tickFormatter: dateText,
          }}
          referenceLines={referenceLines.map((l) => ({
            ...(l.x !== undefined ? { x: l.x } : { y: l.y }),
            label: l.label,
            ...(l.side
              ? { labelPosition: l.side === 'left' ? 'insideTopRight' : 'insideTopLeft' }
              : {}),
            color: l.color,
            strokeDasharray: '6 4',
          }))}
        />
      )}
      <Text component="figcaption" size="sm" mt={4} data-testid="wear-summary">
        {fit && fit.kind === 'trend'
          ? `Wear rate ${rateText(fit.rate, fit.rateStandardError)} mm per 30 days (± one standard error, ${fit.n} readings).` +
            (crossing
              ? ` Minimum reached about ${isoDay(dateOf(crossing.at))}, 95 % prediction interval ${isoDay(dateOf(crossing.lower))} to ${isoDay(dateOf(crossing.upper))}: plan the ${work} before the first date.`
              : '')
          : (series.note ?? 'No readings yet.')}
      </Text>
    </Paper>
  );
}
