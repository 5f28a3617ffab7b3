import { memo, useId, useMemo, useState } from 'react';
import { Alert, Anchor, List } from '@mantine/core';
import { notesFirst } from '../utils/notes-order';

/**
 * Collapsed, the box shows this many notes whole: a note cut off or faded half-way through reads
 * as a different note, so the box hides whole notes or none.
 */
const SHOWN_COLLAPSED = 2;

/** The core's notes on the inputs; a new evaluation with the same notes does not render them again. */
export const CalculationNotes = memo(
  function CalculationNotes({ warnings }: { warnings: readonly string[] }) {
    const [open, setOpen] = useState(false);
    const listId = useId();
    const ordered = useMemo(() => notesFirst(warnings), [warnings]);
    if (warnings.length === 0) return null;
    const more = ordered.length - SHOWN_COLLAPSED;
    const shown = open || more <= 0 ? ordered : ordered.slice(0, SHOWN_COLLAPSED);
    return (
      <Alert
        color="amber"
        variant="outline"
        mb="sm"
        p="xs"
        title={`Notes from the calculation (${warnings.length})`}
      >
        <List size="xs" spacing={2} id={listId}>
          {shown.map((w) => (
            <List.Item key={w}>{w}</List.Item>
          ))}
        </List>
        {more > 0 ? (
          <Anchor
            component="button"
            type="button"
            size="xs"
            fw={600}
            mt={4}
            aria-expanded={open}
            aria-controls={listId}
            onClick={() => setOpen((o) => !o)}
          >
            {open ? 'Show fewer' : `Show all ${ordered.length} notes`}
          </Anchor>
        ) : null}
      </Alert>
    );
  },
  (a, b) =>
    a.warnings.length === b.warnings.length && a.warnings.every((w, k) => w === b.warnings[k]),
);
