import { createTheme, type CSSVariablesResolver, type MantineColorsTuple } from '@mantine/core';

/** Forged steel: a deep blue-grey, Holdfast's primary colour. */
const steel: MantineColorsTuple = [
  '#eef2f6',
  '#dce3ea',
  '#b7c5d3',
  '#8fa5bb',
  '#6d8aa6',
  '#587898',
  '#4a6a8b',
  '#3b5773',
  '#2f465d',
  '#1f3244',
];

/** Safety amber: the accent, used sparingly for attention and cautions. */
const amber: MantineColorsTuple = [
  '#fff7e1',
  '#ffedc7',
  '#ffd98f',
  '#ffc452',
  '#ffb323',
  '#ffa806',
  '#e69500',
  '#c27a00',
  '#a66700',
  '#8a5400',
];

/** Pass: a plain green, always shown together with an icon and a word. */
const pass: MantineColorsTuple = [
  '#e9f8ee',
  '#d5efdd',
  '#a8dcb9',
  '#78c892',
  '#51b772',
  '#39ad5e',
  '#2a9950',
  '#1f8443',
  '#176f37',
  '#0c5a2a',
];

/** Fail: a brick red, always shown together with an icon and a word. */
const fail: MantineColorsTuple = [
  '#ffebe9',
  '#fcd6d2',
  '#f3aaa2',
  '#eb7c70',
  '#e45546',
  '#e03d2c',
  '#c9301f',
  '#b02618',
  '#981d12',
  '#7d140b',
];

export const theme = createTheme({
  primaryColor: 'steel',
  primaryShade: { light: 7, dark: 4 },
  colors: { steel, amber, pass, fail },
  fontFamily:
    'Inter, system-ui, -apple-system, "Segoe UI", Roboto, "Helvetica Neue", Arial, sans-serif',
  fontFamilyMonospace: '"JetBrains Mono", ui-monospace, "SFMono-Regular", Menlo, monospace',
  headings: {
    fontFamily: 'Inter, system-ui, sans-serif',
    fontWeight: '600',
  },
  defaultRadius: 'sm',
  cursorType: 'pointer',
  focusRing: 'auto',
  // Filled badges and buttons pick dark or light text by their colour, so amber carries black
  // text (6.1:1) instead of white (3.5:1).
  autoContrast: true,
  luminanceThreshold: 0.2,
  other: {
    headerHeight: 56,
    navbarWidth: 232,
  },
  components: {
    Button: { defaultProps: { radius: 'sm' } },
    // Badges carry units and symbols (ms, MPa): never change their case.
    Badge: {
      defaultProps: { radius: 'sm', variant: 'light', tt: 'none' },
      // A verdict badge is never squeezed to "P…" by the text beside it.
      // (a label that hides its overflow has no minimum width, so a flex row could crush it).
      styles: {
        root: { flexShrink: 0, overflow: 'visible' },
        label: { overflow: 'visible', textOverflow: 'clip' },
      },
    },
    Paper: { defaultProps: { withBorder: true, radius: 'sm' } },
    Tooltip: { defaultProps: { withArrow: true, openDelay: 300 } },
    // A region that scrolls (a wide table at 1024 px) must be reachable by keyboard to scroll it.
    ScrollArea: { defaultProps: { viewportProps: { tabIndex: 0 } } },
    Modal: { defaultProps: { centered: true, radius: 'sm' } },
  },
});

/**
 * Secondary ("dimmed") text at WCAG AA: Mantine's grey-6 reads 3.3:1 on white; this grey reads
 * 5.5:1 on white and 4.8:1 on the light grey panels.
 */
export const cssVariablesResolver: CSSVariablesResolver = () => ({
  variables: {},
  light: {
    '--mantine-color-dimmed': '#616a73',
    // Field errors (and error borders) in the app's own brick red: Mantine's red-6 reads 3.3:1 on
    // white, fail-6 reads 5.4:1.
    '--mantine-color-error': 'var(--mantine-color-fail-6)',
    // Text of light alerts and badges in the darker shades, at AA on their tinted backgrounds.
    '--mantine-color-amber-light-color': 'var(--mantine-color-amber-9)',
    '--mantine-color-pass-light-color': 'var(--mantine-color-pass-9)',
    '--mantine-color-fail-light-color': 'var(--mantine-color-fail-8)',
    '--mantine-color-steel-light-color': 'var(--mantine-color-steel-8)',
    '--mantine-color-amber-outline': 'var(--mantine-color-amber-9)',
  },
  dark: {},
});
