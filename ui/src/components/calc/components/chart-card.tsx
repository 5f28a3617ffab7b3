import { Paper, Text, Title } from '@mantine/core';
import { LineChart } from '@mantine/charts';
import { formatNumber } from '@holdfast/calc';
import type { DisplayChart } from '../utils/chart-data';

/** Axis ticks: three significant figures, no trailing zeros ('0.05', '1200'). */
function shortTick(v: number): string {
  return Number(v.toPrecision(3)).toString().replace('-', '−');
}

const COLORS = ['steel.7', 'amber.7', 'pass.7', 'fail.6', 'grape.6', 'cyan.7'];

/** One engineering chart: series as lines over a numeric x axis, with reference lines and marked points. */
export function ChartCard({ chart }: { chart: DisplayChart }) {
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
        referenceLines={chart.referenceLines.map((l) => ({
          ...(l.axis === 'x' ? { x: l.value } : { y: l.value }),
          label: l.label,
          color: 'fail.7',
          strokeDasharray: '6 4',
          labelPosition: l.axis === 'x' ? 'insideTopLeft' : 'insideBottomRight',
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
