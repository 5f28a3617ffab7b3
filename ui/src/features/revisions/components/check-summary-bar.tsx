import { memo } from 'react';
import { Group, Paper, Text, UnstyledButton } from '@mantine/core';
import type { SheetEvaluation } from '@holdfast/calc';
import { Verdict } from '../../../components/calc/components/verdict';

/**
 * The verdict and the failing checks in one line, kept at the top of the screen on narrow
 * screens where the results sit below the inputs; a tap goes to the results.
 */
export const CheckSummaryBar = memo(function CheckSummaryBar({
  evaluation,
  className,
}: {
  evaluation: SheetEvaluation | null;
  className?: string;
}) {
  if (!evaluation) return null;
  const failing = evaluation.checks.filter((c) => !c.pass);
  return (
    <Paper p="xs" shadow="xs" className={className} data-testid="check-summary-bar">
      <UnstyledButton
        w="100%"
        onClick={() =>
          document.getElementById('results-title')?.scrollIntoView({ behavior: 'smooth' })
        }
        aria-label="Go to the results"
      >
        <Group gap="xs" wrap="nowrap">
          <Verdict pass={evaluation.pass} />
          <Text size="sm" style={{ minWidth: 0 }} truncate="end">
            {evaluation.checks.length - failing.length} of {evaluation.checks.length} checks pass
            {failing.length > 0 ? ` · failing: ${failing.map((c) => c.label).join(', ')}` : ''}
          </Text>
        </Group>
      </UnstyledButton>
    </Paper>
  );
});
