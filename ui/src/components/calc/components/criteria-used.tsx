import { useState } from 'react';
import { Anchor, Collapse, List, Text } from '@mantine/core';
import type { CriteriaSet } from '@holdfast/calc';
import { criterionDisplay } from '../utils/criterion-value';
import type { UnitSystem } from '../utils/units';

/**
 * The acceptance criteria an evaluation rests on: the set by name and version and, on request,
 * the values its checks read (`criteriaUsed`), each with its source, as the printed design basis
 * lists them. An evaluation stored before the core kept that list names the set only.
 */
export function CriteriaUsed(props: {
  criteria: CriteriaSet;
  used: string[] | undefined;
  unitSystem: UnitSystem;
}) {
  const { criteria, used, unitSystem } = props;
  const [open, setOpen] = useState(false);
  const values = used ? criteria.values.filter((v) => used.includes(v.key)) : undefined;
  return (
    <Text size="xs" c="dimmed" component="div" data-testid="criteria-used">
      Criteria: {criteria.name}, version {criteria.version}
      {values && values.length > 0 ? (
        <>
          {' · '}
          <Anchor
            component="button"
            type="button"
            size="xs"
            onClick={() => setOpen((o) => !o)}
            aria-expanded={open}
          >
            {open ? 'hide' : 'show'} the {values.length} value{values.length === 1 ? '' : 's'} the
            checks use
          </Anchor>
          <Collapse expanded={open}>
            <List size="xs" mt={4} spacing={2}>
              {values.map((v) => {
                const shown = criterionDisplay(v, unitSystem);
                return (
                  <List.Item key={v.key}>
                    {v.label}: {shown.number}
                    {shown.unit ? `\u2009${shown.unit}` : ''} ({v.source})
                  </List.Item>
                );
              })}
            </List>
          </Collapse>
        </>
      ) : values ? (
        ' · its checks read no value of the set (each names its own limit)'
      ) : null}
    </Text>
  );
}
