import { memo } from 'react';
import { Badge } from '@mantine/core';
import { IconCircleCheck, IconCircleX } from '@tabler/icons-react';

/** PASS or FAIL in words with an icon; the colour only repeats what the word says. */
export const Verdict = memo(function Verdict({
  pass,
  size = 'md',
}: {
  pass: boolean;
  size?: 'sm' | 'md' | 'lg';
}) {
  const Icon = pass ? IconCircleCheck : IconCircleX;
  return (
    <Badge
      color={pass ? 'pass' : 'fail'}
      variant={pass ? 'light' : 'filled'}
      size={size}
      leftSection={<Icon size={14} stroke={2} aria-hidden />}
      style={{ flexShrink: 0 }}
    >
      {pass ? 'Pass' : 'Fail'}
    </Badge>
  );
});
