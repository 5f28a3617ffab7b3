import { Group, Text } from '@mantine/core';
import { HoldfastMark } from './holdfast-mark';
import classes from './wordmark.module.css';

export function Wordmark({ size = 'md' }: { size?: 'md' | 'lg' }) {
  const mark = size === 'lg' ? 40 : 28;
  return (
    <Group gap={8} wrap="nowrap" className={classes.root}>
      <HoldfastMark size={mark} />
      <Text component="span" className={size === 'lg' ? classes.large : classes.text}>
        holdfast
      </Text>
    </Group>
  );
}
