import { Paper, Text, Title } from '@mantine/core';
import { LineChart } from '@mantine/charts';
import { formatNumber } from '@holdfast/calc';
import type { DisplayChart } from '../utils/chart-data';

/** Axis ticks: three significant figures, no trailing zeros ('0.05', '1200'). */
function shortTick(v: number): string {
  return Number(v.toPrecision(3)).toString().replace('-', '−');
}

const COLORS = ['steel.7', 'amber.7', 'pass.7', 'fail.6', 'grape.6', 'cyan.7'];

type LabelPosition = 'insideTopLeft' | 'insideTopRight' | 'insideBottomLeft' | 'insideBottomRight';

/**
 * Where each reference line's label sits. Vertical lines close together (re-adjust at 0.6 mm,
 * reserve used up at 0.8 mm) would print their labels over each other, and one at the right end
 * would run off the chart: a label goes on the side of its line with more room, and successive
 * vertical lines alternate between top and bottom.
 */
export function labelPositions(chart: DisplayChart): LabelPosition[] {
  const xs = chart.rows.map((r) => r.x).filter((v): v is number => typeof v === 'number');
  const mid = xs.length > 0 ? (Math.min(...xs) + Math.max(...xs)) / 2 : 0;
  const vertical = chart.referenceLines
    .map((l, i) => ({ l, i }))
    .filter(({ l }) => l.axis === 'x')
    .sort((a, b) => a.l.value - b.l.value);
  const out: LabelPosition[] = chart.referenceLines.map(() => 'insideBottomRight');
  vertical.forEach(({ l, i }, k) => {
    const side = l.value > mid ? 'Right' : 'Left';
    out[i] = `inside${k % 2 === 0 ? 'Top' : 'Bottom'}${side}` as LabelPosition;
  });
  return out;
}

/** One engineering chart: series as lines over a numeric x axis, with reference lines and marked points. */
export function ChartCard({ chart }: { chart: DisplayChart }) {
  const positions = labelPositions(chart);
  return (
    <Paper p="sm" component="figure" m={0} aria-label={chart.title} data-chart={chart.id}>
      <Title order={4} size="h6" mb="xs">
        {chart.title}
      </Title>
      <LineChart
        h={240}
        data={chart.rows}
        dataKey="x"
        series={chart.seriesNames.map((name, i) => ({ name, color: COLORS[i % COLORS.length] }))}
        curveType="linear"
        withDots={false}
        connectNulls
        withLegend={chart.seriesNames.length > 1}
        legendProps={{ verticalAlign: 'bottom', height: 40 }}
        xAxisLabel={chart.xLabel}
        yAxisLabel={chart.yLabel}
        gridAxis="xy"
        valueFormatter={(v) => formatNumber(v, 4)}
        yAxisProps={{ width: 64, tickFormatter: shortTick }}
        xAxisProps={{
          type: 'number',
          domain: ['dataMin', 'dataMax'],
          tickFormatter: shortTick,
        }}
        referenceLines={chart.referenceLines.map((l, i) => ({
          ...(l.axis === 'x' ? { x: l.value } : { y: l.value }),
          label: l.label,
          color: 'fail.7',
          strokeDasharray: '6 4',
          labelPosition: positions[i],
        }))}
        referenceDots={chart.markers.map((m) => ({
          x: m.x,
          y: m.y,
          r: 5,
          color: 'amber.8',
          label: m.label,
          labelPosition: 'top',
        }))}
      />
      <Text component="figcaption" size="xs" c="dimmed" mt={4}>
        {chart.yLabel} against {chart.xLabel.charAt(0).toLowerCase() + chart.xLabel.slice(1)}
      </Text>
    </Paper>
  );
}
