import { useMemo } from 'react';
import { SimpleGrid, Text } from '@mantine/core';
import type { ChartData } from '@holdfast/calc';
import { ChartCard } from './chart-card';
import { toDisplayChart } from '../utils/chart-data';
import type { UnitSystem } from '../utils/units';

/** All charts of an evaluation. Loaded on demand: it pulls in recharts. */
export default function EvaluationCharts({
  charts,
  unitSystem,
}: {
  charts: ChartData[];
  unitSystem: UnitSystem;
}) {
  const shown = useMemo(
    () => charts.map((c) => toDisplayChart(c, unitSystem)),
    [charts, unitSystem],
  );
  if (shown.length === 0) return <Text c="dimmed">This sheet type draws no charts.</Text>;
  return (
    <SimpleGrid cols={1} spacing="md">
      {shown.map((c) => (
        <ChartCard key={c.id} chart={c} />
      ))}
    </SimpleGrid>
  );
}
