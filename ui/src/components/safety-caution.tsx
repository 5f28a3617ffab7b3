import { Group, Text, ThemeIcon } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import classes from './safety-caution.module.css';

/** The standard caution, in Holdfast's own words. Shown on every calculation page. */
export const safetyCautionText =
  'Results from Holdfast support, and never replace, the judgement of a competent engineer. ' +
  "The governing standard, the brake maker's data, local codes and licensed practice decide. " +
  'Never work under a suspended load: land the load or lock the drum, and lock out the drive.';

/**
 * The same caution in fewer words, for the footer band on a phone: the whole text runs to six
 * lines there and would be cut off at the band's height.
 */
export const shortSafetyCautionText =
  "Supports, never replaces, a competent engineer's judgement; the standard, the maker's data " +
  'and local codes decide. Never work under a suspended load; lock out the drive.';

export interface SafetyCautionProps {
  /** `footer`: one compact band for the frame footer; `block`: a boxed note inside a page. */
  variant?: 'footer' | 'block';
}

export function SafetyCaution({ variant = 'block' }: SafetyCautionProps) {
  return (
    <Group
      role="note"
      aria-label="Safety caution"
      className={variant === 'footer' ? classes.footer : classes.block}
      gap="sm"
      wrap="nowrap"
      align="center"
    >
      <ThemeIcon
        color="amber"
        variant="filled"
        size={variant === 'footer' ? 'md' : 'lg'}
        radius="sm"
      >
        <IconAlertTriangle size={variant === 'footer' ? 16 : 20} stroke={2} aria-hidden />
      </ThemeIcon>
      {variant === 'footer' ? (
        <>
          <Text size="xs" className={classes.text} visibleFrom="md">
            <strong>Caution.</strong> {safetyCautionText}
          </Text>
          <Text size="xs" className={classes.text} hiddenFrom="md">
            <strong>Caution.</strong> {shortSafetyCautionText}
          </Text>
        </>
      ) : (
        <Text size="sm" className={classes.text}>
          <strong>Caution.</strong> {safetyCautionText}
        </Text>
      )}
    </Group>
  );
}
