import { Box, Text } from '@mantine/core';

/** Scale of the bar: 0 … 125 % utilisation, with the limit (100 %) marked. */
const SCALE = 1.25;

/**
 * How much of the allowed margin a check uses. The bar has a tick at the limit and the number
 * beside it, so the reading never depends on colour.
 */
export function UtilisationBar({ utilisation, pass }: { utilisation: number; pass: boolean }) {
  const finite = Number.isFinite(utilisation) ? Math.max(0, utilisation) : SCALE;
  const width = Math.min(finite / SCALE, 1) * 100;
  const limitAt = (1 / SCALE) * 100;
  const percent = Number.isFinite(utilisation) ? `${Math.round(utilisation * 100)} %` : '∞';
  return (
    <Box style={{ display: 'flex', alignItems: 'center', gap: 8 }}>
      <Box
        role="meter"
        aria-label="Utilisation"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={Math.round(finite * 100)}
        aria-valuetext={`${percent} of the limit`}
        pos="relative"
        h={8}
        style={{ flex: 1, background: 'var(--mantine-color-gray-2)', borderRadius: 4 }}
      >
        <Box
          h={8}
          w={`${width}%`}
          style={{
            background: pass ? 'var(--mantine-color-pass-6)' : 'var(--mantine-color-fail-6)',
            borderRadius: 4,
            backgroundImage: pass
              ? undefined
              : 'repeating-linear-gradient(45deg, transparent 0 4px, rgba(255,255,255,.35) 4px 8px)',
          }}
        />
        <Box
          pos="absolute"
          top={-3}
          h={14}
          w={2}
          left={`${limitAt}%`}
          style={{ background: 'var(--mantine-color-dark-6)' }}
          aria-hidden
        />
      </Box>
      <Text size="xs" ff="monospace" w={48} ta="right">
        {percent}
      </Text>
    </Box>
  );
}
