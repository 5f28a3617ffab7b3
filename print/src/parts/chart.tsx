import type { ChartData } from '@holdfast/calc';
import { Circle, G, Line, Polyline, Svg, Text, View } from '@react-pdf/renderer';
import { toDisplay } from '@holdfast/calc';
import { SANS } from '../fonts.js';
import type { PrintUnitSystem } from '../printable-sheet.js';
import type { BlockContext } from '../blocks.js';
import type { FlowBlock } from '../flow.js';
import { colours, seriesColours } from '../theme.js';
import { niceTicks, tickLabel } from './ticks.js';

const M = { left: 46, right: 12, top: 10, bottom: 30 };

const CHART_HEIGHT = 180;

/** One chart as a page-planning block: title, drawing and legend, measured. */
export function chartBlock(
  ctx: BlockContext,
  chart: ChartData,
  system: PrintUnitSystem,
): FlowBlock {
  const { m, width } = ctx;
  const legend = { fontSize: 7 };
  const yUnit = toDisplay(1, chart.yDimension, system).label;
  const items = [
    m.width(`y: ${yUnit ? `${chart.yLabel} (${yUnit})` : chart.yLabel}`, legend) + 10,
    ...chart.series.map((s) => 12 + 3 + m.width(s.name, legend) + 10),
  ];
  // Legend items wrap as whole items.
  let rows = 1;
  let used = 0;
  for (const w of items) {
    if (used > 0 && used + w > width) {
      rows += 1;
      used = 0;
    }
    used += w;
  }
  const height =
    m.lineHeight({ fontSize: 8.5, weight: 700 }) +
    2 +
    CHART_HEIGHT +
    rows * m.lineHeight(legend) -
    2 +
    8;
  return {
    key: `chart-${chart.id}`,
    height,
    element: <Chart key={chart.id} chart={chart} system={system} width={width} />,
  };
}

/** A chart drawn as vector graphics: axes with ticks, series, set points and reference lines. */
export function Chart(props: {
  chart: ChartData;
  system: PrintUnitSystem;
  width: number;
  height?: number;
}) {
  const { chart, system, width } = props;
  const height = props.height ?? CHART_HEIGHT;
  const cx = (v: number) => toDisplay(v, chart.xDimension, system).value;
  const cy = (v: number) => toDisplay(v, chart.yDimension, system).value;
  const xUnit = toDisplay(1, chart.xDimension, system).label;
  const yUnit = toDisplay(1, chart.yDimension, system).label;
  const series = chart.series.map((s) => s.points.map((p) => ({ x: cx(p.x), y: cy(p.y) })));
  const markers = (chart.markers ?? []).map((m) => ({ label: m.label, x: cx(m.x), y: cy(m.y) }));
  const refs = (chart.referenceLines ?? []).map((r) => ({
    ...r,
    v: r.axis === 'x' ? cx(r.value) : cy(r.value),
  }));
  // Labels of vertical lines stand at the top, one line lower for each vertical line to their
  // left, so two lines close together (re-adjust, reserve used up) never print over each other.
  const xOrder = refs
    .filter((r) => r.axis === 'x')
    .sort((a, b) => a.v - b.v)
    .map((r) => r.label);
  const xs = [
    ...series.flat().map((p) => p.x),
    ...markers.map((m) => m.x),
    ...refs.filter((r) => r.axis === 'x').map((r) => r.v),
  ];
  const ys = [
    ...series.flat().map((p) => p.y),
    ...markers.map((m) => m.y),
    ...refs.filter((r) => r.axis === 'y').map((r) => r.v),
  ];
  const xt = niceTicks(Math.min(...xs), Math.max(...xs));
  const yt = niceTicks(Math.min(0, ...ys), Math.max(...ys));
  const pw = width - M.left - M.right;
  const ph = height - M.top - M.bottom;
  const sx = (x: number) => M.left + ((x - xt.min) / (xt.max - xt.min)) * pw;
  const sy = (y: number) => M.top + ph - ((y - yt.min) / (yt.max - yt.min)) * ph;
  const font = { fontFamily: SANS, fontSize: 6.5, fill: colours.ink };
  return (
    <View wrap={false} style={{ marginBottom: 8 }}>
      <Text style={{ fontWeight: 700, marginBottom: 2 }}>{chart.title}</Text>
      <Svg width={width} height={height}>
        {yt.ticks.map((t) => (
          <G key={`y${t}`}>
            <Line
              x1={M.left}
              x2={M.left + pw}
              y1={sy(t)}
              y2={sy(t)}
              stroke={colours.rule}
              strokeWidth={0.4}
            />
            <Text {...font} x={M.left - 4} y={sy(t) + 2} textAnchor="end">
              {tickLabel(t, yt.step)}
            </Text>
          </G>
        ))}
        {xt.ticks.map((t) => (
          <G key={`x${t}`}>
            <Line
              x1={sx(t)}
              x2={sx(t)}
              y1={M.top + ph}
              y2={M.top + ph + 3}
              stroke={colours.ink}
              strokeWidth={0.6}
            />
            <Text {...font} x={sx(t)} y={M.top + ph + 11} textAnchor="middle">
              {tickLabel(t, xt.step)}
            </Text>
          </G>
        ))}
        <Line
          x1={M.left}
          x2={M.left}
          y1={M.top}
          y2={M.top + ph}
          stroke={colours.ink}
          strokeWidth={0.8}
        />
        <Line
          x1={M.left}
          x2={M.left + pw}
          y1={M.top + ph}
          y2={M.top + ph}
          stroke={colours.ink}
          strokeWidth={0.8}
        />
        {refs.map((r) =>
          r.axis === 'y' ? (
            <G key={`r${r.label}`}>
              <Line
                x1={M.left}
                x2={M.left + pw}
                y1={sy(r.v)}
                y2={sy(r.v)}
                stroke={colours.fail}
                strokeWidth={0.8}
                strokeDasharray="4 2"
              />
              <Text
                {...font}
                fill={colours.fail}
                x={M.left + pw - 2}
                y={sy(r.v) - 2}
                textAnchor="end"
              >
                {r.label}
              </Text>
            </G>
          ) : (
            <G key={`r${r.label}`}>
              <Line
                x1={sx(r.v)}
                x2={sx(r.v)}
                y1={M.top}
                y2={M.top + ph}
                stroke={colours.fail}
                strokeWidth={0.8}
                strokeDasharray="4 2"
              />
              <Text
                {...font}
                fill={colours.fail}
                x={sx(r.v) > M.left + pw * 0.7 ? sx(r.v) - 3 : sx(r.v) + 3}
                y={M.top + 7 + 8 * xOrder.indexOf(r.label)}
                textAnchor={sx(r.v) > M.left + pw * 0.7 ? 'end' : 'start'}
              >
                {/* An arrow to its own line: a long label reaches across a nearer line. */}
                {sx(r.v) > M.left + pw * 0.7 ? `${r.label} →` : `← ${r.label}`}
              </Text>
            </G>
          ),
        )}
        {series.map((pts, i) => (
          <Polyline
            key={chart.series[i].name}
            points={pts.map((p) => `${sx(p.x).toFixed(2)},${sy(p.y).toFixed(2)}`).join(' ')}
            fill="none"
            stroke={seriesColours[i % seriesColours.length]}
            strokeWidth={1.3}
          />
        ))}
        {markers.map((m) => (
          <G key={`m${m.label}`}>
            <Circle cx={sx(m.x)} cy={sy(m.y)} r={2.6} fill={colours.ink} />
            <Text {...font} x={sx(m.x) + 4} y={sy(m.y) - 4}>
              {m.label}
            </Text>
          </G>
        ))}
        <Text {...font} x={M.left + pw / 2} y={height - 4} textAnchor="middle">
          {xUnit ? `${chart.xLabel} (${xUnit})` : chart.xLabel}
        </Text>
      </Svg>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', fontSize: 7, marginTop: -2 }}>
        <Text style={{ marginRight: 10, color: colours.muted }}>
          y: {yUnit ? `${chart.yLabel} (${yUnit})` : chart.yLabel}
        </Text>
        {chart.series.map((s, i) => (
          <View
            key={s.name}
            style={{ flexDirection: 'row', alignItems: 'center', marginRight: 10 }}
          >
            <View
              style={{
                width: 12,
                height: 2,
                backgroundColor: seriesColours[i % seriesColours.length],
                marginRight: 3,
              }}
            />
            <Text>{s.name}</Text>
          </View>
        ))}
      </View>
    </View>
  );
}
