import { Text as PdfText } from '@react-pdf/renderer';
import type { ComponentProps } from 'react';

/**
 * Knuth–Plass "infinite" penalty: react-pdf's line breaker never breaks at a penalty this high.
 * If textkit changes that value, text.test.ts sees words split again and fails.
 */
export const NO_BREAK_PENALTY = 10_000;

/**
 * react-pdf's Text, never broken inside a word. react-pdf splits a word where its font changes (a
 * Greek letter comes from the Greek subset of the font) and offers that point as a hyphenation
 * break, so "(M_L/η)" could print as "(M_L/-" over "η)", a minus sign in a formula. Words still
 * wrap at spaces, as the page planner measures them.
 */
export function Text(props: ComponentProps<typeof PdfText>) {
  return <PdfText hyphenationPenalty={NO_BREAK_PENALTY} {...props} />;
}
