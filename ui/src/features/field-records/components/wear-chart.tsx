import { Paper, Text, Title } from '@mantine/core';
import { LineChart } from '@mantine/charts';
import { dateOf, mmPerMonth, type WearSeries } from './wear-series';

const DAY_MS = 86400000;
const day = (d: Date) => Math.round(d.getTime() / DAY_MS);
const dateText = (dayNumber: number) => new Date(dayNumber * DAY_MS).toISOString().slice(0, 10);

/**
 * Readings of one length over time with the fitted line, the minimum, and the predicted date the
 * line reaches it with its 95 % prediction interval (calc's fitWearTrend).
 */
export function WearChart({ title, series }: { title: string; series: WearSeries }) {
  const { readings, fit, minimum } = series;
  const crossing = fit?.kind === 'trend' ? fit.crossing : undefined;
  const rows: { x: number; Measured?: number; Fitted?: number }[] = readings.map((r) => ({
    x: day(r.at),
    Measured: r.value * 1000,
  }));
  if (fit) {
    const first = readings[0]!.at.getTime() / 1000;
    const last = crossing ? crossing.at : readings[readings.length - 1]!.at.getTime() / 1000;
    for (const s of [first, last]) {
      rows.push({ x: day(dateOf(s)), Fitted: (fit.intercept + fit.slope * s) * 1000 });
    }
  }
  rows.sort((a, b) => a.x - b.x);
  const referenceLines: { x?: number; y?: number; label: string; color: string }[] = [];
  if (minimum !== null)
    referenceLines.push({ y: minimum * 1000, label: 'minimum', color: 'fail.7' });
  if (crossing) {
    referenceLines.push(
      { x: day(dateOf(crossing.lower)), label: 'from', color: 'amber.8' },
      { x: day(dateOf(crossing.upper)), label: 'to', color: 'amber.8' },
    );
  }
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
          valueFormatter={(v) => v.toFixed(2)}
          xAxisProps={{ type: 'number', domain: ['dataMin', 'dataMax'], tickFormatter: dateText }}
          referenceLines={referenceLines.map((l) => ({
            ...(l.x !== undefined ? { x: l.x } : { y: l.y }),
            label: l.label,
            color: l.color,
            strokeDasharray: '6 4',
          }))}
        />
      )}
      <Text component="figcaption" size="sm" mt={4} data-testid="wear-summary">
        {fit && fit.kind === 'trend'
          ? `Wear rate ${mmPerMonth(fit.rate).toFixed(3)} ± ${mmPerMonth(fit.rateStandardError).toFixed(3)} mm per 30 days (± one standard error, ${fit.n} readings).` +
            (crossing
              ? ` Minimum reached about ${dateOf(crossing.at).toISOString().slice(0, 10)}, 95 % prediction interval ${dateOf(crossing.lower).toISOString().slice(0, 10)} to ${dateOf(crossing.upper).toISOString().slice(0, 10)}: plan the re-adjustment before the first date.`
              : '')
          : (series.note ?? 'No readings yet.')}
      </Text>
    </Paper>
  );
}
