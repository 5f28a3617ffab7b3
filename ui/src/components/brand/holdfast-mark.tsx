import type { SVGProps } from 'react';

/**
 * Holdfast's mark: a drum held between two shoes. Drawn for Holdfast; `currentColor` is the drum,
 * the shoes take the accent colour.
 */
export function HoldfastMark({
  size = 28,
  accent = 'var(--mantine-color-amber-4)',
  ...rest
}: SVGProps<SVGSVGElement> & { size?: number; accent?: string }) {
  return (
    <svg
      width={size}
      height={size}
      viewBox="0 0 32 32"
      fill="none"
      aria-hidden="true"
      focusable="false"
      {...rest}
    >
      <circle cx="16" cy="16" r="6.5" stroke="currentColor" strokeWidth="2.5" />
      <circle cx="16" cy="16" r="1.6" fill="currentColor" />
      <path
        d="M8.5 5.5a13 13 0 0 0 0 21M23.5 5.5a13 13 0 0 1 0 21"
        stroke={accent}
        strokeWidth="3.2"
        strokeLinecap="round"
      />
    </svg>
  );
}
