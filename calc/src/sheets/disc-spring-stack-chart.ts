import type { ChartData, SheetEvaluation } from '../core/types.js';
import { backOffPreload } from '../disc-springs/back-off.js';
import { stackCurve, WORKING_BAND } from '../disc-springs/curve.js';
import type { StackOutputInput } from './disc-spring-stack-output.js';

type Table = SheetEvaluation['tables'][number];

/** Load–deflection chart of one stack: loading/unloading with friction, set point, working band. */
export function loadDeflectionChart(x: StackOutputInput): ChartData {
  const { key, r, stack } = x;
  const curve = stackCurve(stack, 40, r.constants);
  const i = stack.seriesCount;
  return {
    id: `${key}-load-deflection`,
    title: `${x.title}: load–deflection`,
    xLabel: 'Stack deflection',
    xUnit: 'm',
    xDimension: 'length',
    yLabel: 'Stack force',
    yUnit: 'N',
    yDimension: 'force',
    series: [
      {
        name: 'loading (with friction)',
        points: curve.map((p) => ({ x: p.stackDeflection, y: p.loading })),
      },
      {
        name: 'without friction',
        points: curve.map((p) => ({ x: p.stackDeflection, y: p.nominal })),
      },
      {
        name: 'unloading (with friction)',
        points: curve.map((p) => ({ x: p.stackDeflection, y: p.unloading })),
      },
    ],
    markers: [{ label: 'set point', x: r.setDeflection * i, y: r.stackUnloading }],
    referenceLines: [
      {
        label: `working band min ${WORKING_BAND.min}·h₀ (memory)`,
        axis: 'x',
        value: WORKING_BAND.min * r.h0 * i,
      },
      {
        label: `working band max ${WORKING_BAND.max}·h₀ (memory)`,
        axis: 'x',
        value: WORKING_BAND.max * r.h0 * i,
      },
      ...(x.required > 0
        ? [{ label: 'required preload', axis: 'y' as const, value: x.required }]
        : []),
    ],
  };
}

/** Back-off angle (every 30°, up to flat travel or three turns) against preload, for the field team. */
export function backOffTable(x: StackOutputInput): Table {
  const { key, r, stack } = x;
  const i = stack.seriesCount;
  const rows: Record<string, number>[] = [];
  const maxDeg = (360 * i * r.h0) / x.lead;
  for (let deg = 0; deg <= Math.min(maxDeg, 1080) + 1e-9; deg += 30) {
    const b = backOffPreload(stack, x.lead, deg, r.constants);
    rows.push({
      angle: (deg * Math.PI) / 180,
      release: b.release,
      setLength: r.freeLength - b.stackDeflection,
      preload: b.forces.unloading,
    });
  }
  return {
    id: `${key}-back-off`,
    title: `${x.title}: back-off angle against preload`,
    columns: [
      { key: 'angle', label: 'Back-off from flat', unit: 'rad', dimension: 'angle' },
      { key: 'release', label: 'Axial release', unit: 'm', dimension: 'length' },
      { key: 'setLength', label: 'Stack length', unit: 'm', dimension: 'length' },
      { key: 'preload', label: 'Preload (unloading)', unit: 'N', dimension: 'force' },
    ],
    rows,
  };
}
