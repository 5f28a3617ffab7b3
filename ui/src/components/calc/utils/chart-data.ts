import type { ChartData, Dimension } from '@holdfast/calc';
import { presentPrinted, type UnitSystem } from './units';
import { toDisplay } from '@holdfast/calc';

export interface DisplayChart {
  id: string;
  title: string;
  xLabel: string;
  yLabel: string;
  rows: Record<string, number | null>[];
  seriesNames: string[];
  referenceLines: { axis: 'x' | 'y'; value: number; label: string }[];
  markers: { x: number; y: number; label: string }[];
}

function converter(
  dimension: string,
  system: UnitSystem,
): { convert: (v: number) => number; unit: string } {
  try {
    const probe = toDisplay(0, dimension as Dimension, system);
    return {
      convert: (v) => toDisplay(v, dimension as Dimension, system).value,
      unit: probe.label,
    };
  } catch {
    return { convert: (v) => v, unit: '' };
  }
}

/**
 * Converts a chart from SI into the display unit system and lays its series out as rows keyed by
 * x, one column per series (null where a series has no point), as recharts expects.
 */
export function toDisplayChart(chart: ChartData, system: UnitSystem): DisplayChart {
  const x = converter(chart.xDimension, system);
  const y = converter(chart.yDimension, system);
  const byX = new Map<number, Record<string, number | null>>();
  for (const series of chart.series) {
    for (const p of series.points) {
      const xv = roundKey(x.convert(p.x));
      const row = byX.get(xv) ?? { x: xv };
      row[series.name] = y.convert(p.y);
      byX.set(xv, row);
    }
  }
  const names = chart.series.map((s) => s.name);
  const rows = [...byX.values()]
    .sort((a, b) => (a.x as number) - (b.x as number))
    .map((row) => {
      for (const n of names) if (!(n in row)) row[n] = null;
      return row;
    });
  return {
    id: chart.id,
    title: chart.title,
    xLabel: x.unit ? `${chart.xLabel} (${x.unit})` : chart.xLabel,
    yLabel: y.unit ? `${chart.yLabel} (${y.unit})` : chart.yLabel,
    rows,
    seriesNames: names,
    referenceLines: (chart.referenceLines ?? []).map((l) => ({
      axis: l.axis,
      // To the printed sheet's precision: 'Re-adjust: 0.60 mm', not 'Re-adjust: 0.6000 mm'.
      label: `${l.label}: ${presentPrinted(l.value, (l.axis === 'x' ? chart.xDimension : chart.yDimension) as Dimension, system).text}`,
      value: l.axis === 'x' ? x.convert(l.value) : y.convert(l.value),
    })),
    markers: (chart.markers ?? []).map((m) => ({
      label: m.label,
      x: x.convert(m.x),
      y: y.convert(m.y),
    })),
  };
}

function roundKey(v: number): number {
  return Number(v.toPrecision(10));
}
