import { StyleSheet } from '@react-pdf/renderer';
import { MONO, SANS } from './fonts.js';

/** Holdfast print palette: slate ink, a deep teal accent, and unambiguous pass/fail colours. */
export const colours = {
  ink: '#1b2430',
  muted: '#5b6675',
  rule: '#c5ced8',
  band: '#eef3f5',
  accent: '#0f5e6b',
  accentLight: '#d7e9ec',
  pass: '#1e7b3a',
  passBg: '#e3f2e7',
  fail: '#b3261e',
  failBg: '#fbe5e3',
  marking: '#c0392b',
  caution: '#8a5a00',
  cautionBg: '#fff6e0',
};

/** Series colours for charts, distinguishable in greyscale print too (dark → light). */
export const seriesColours = ['#0f5e6b', '#c2611f', '#5b3f8c', '#2f7d32', '#8a8f98'];

/** Thin rule under a table row or a derivation step; its width counts in planned heights. */
export const ROW_RULE = 0.4;
export const ruledRow = {
  flexDirection: 'row',
  borderBottomWidth: ROW_RULE,
  borderColor: colours.rule,
} as const;

export const monoFont = { fontFamily: MONO, fontFeatureSettings: { calt: false } } as const;

export const s = StyleSheet.create({
  page: {
    fontFamily: SANS,
    fontSize: 8.5,
    color: colours.ink,
    paddingTop: 28,
    paddingBottom: 40,
    paddingHorizontal: 34,
  },
  h1: { fontSize: 12, fontWeight: 700, color: colours.accent, marginTop: 10, marginBottom: 5 },
  h2: { fontSize: 9.5, fontWeight: 700, marginTop: 8, marginBottom: 3 },
  para: { marginBottom: 4 },
  small: { fontSize: 7, color: colours.muted },
  mono: { ...monoFont, fontSize: 7.8 },
  bold: { fontWeight: 700 },
});
