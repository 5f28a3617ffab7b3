import { useState, type ReactNode } from 'react';
import { Box, Code, Collapse, Group, Stack, Text, Title, UnstyledButton } from '@mantine/core';
import { IconChevronRight } from '@tabler/icons-react';
import {
  formatForDerivation,
  type DerivationStep,
  type Dimension,
  type SectionDefinition,
} from '@holdfast/calc';
import { Aside } from './aside';
import { sectionOrder } from './results-table';
import { presentPrinted, type UnitSystem } from '../utils/units';

export interface DerivationListProps {
  /**
   * The evaluation, not its steps: the core builds the printed steps when `derivation` is first
   * read, so reading it here, only while this tab is open, keeps it out of every keystroke.
   */
  evaluation: { readonly derivation: DerivationStep[] };
  sections: SectionDefinition[];
  unitSystem: UnitSystem;
  renderStepAside?: (id: string) => ReactNode;
}

/** Every derivation step by section; each opens to its formula, substitution and reference. */
export function DerivationList({
  evaluation,
  sections,
  unitSystem,
  renderStepAside,
}: DerivationListProps) {
  const steps = evaluation.derivation;
  const order = sectionOrder(
    sections,
    steps.map((s) => s.section),
  );
  return (
    <Stack gap="xs">
      {order.map((section) => {
        const list = steps.filter((s) => s.section === section.id);
        if (list.length === 0) return null;
        return (
          <div key={section.id}>
            <Title order={4} size="h6" mt="xs" mb={4}>
              {section.title}
            </Title>
            <Stack gap={2}>
              {list.map((step) => (
                <StepRow
                  key={step.id}
                  step={step}
                  unitSystem={unitSystem}
                  aside={
                    renderStepAside ? <Aside id={step.id} render={renderStepAside} /> : undefined
                  }
                />
              ))}
            </Stack>
          </div>
        );
      })}
    </Stack>
  );
}

function StepRow({
  step,
  unitSystem,
  aside,
}: {
  step: DerivationStep;
  unitSystem: UnitSystem;
  aside?: ReactNode;
}) {
  const [open, setOpen] = useState(false);
  // As the printed derivation writes the result: in the units of its substitution in SI.
  const result =
    unitSystem === 'SI'
      ? { text: formatForDerivation(step.value, step.dimension as Dimension) }
      : presentPrinted(step.value, step.dimension as Dimension, unitSystem);
  const bodyId = `step-body-${step.id}`;
  return (
    <Box data-step={step.id} style={{ borderBottom: '1px solid var(--mantine-color-gray-2)' }}>
      <Group gap={4} wrap="nowrap" align="center">
        <UnstyledButton
          onClick={() => setOpen((o) => !o)}
          aria-expanded={open}
          aria-controls={bodyId}
          py={4}
          style={{ flex: 1, minWidth: 0 }}
        >
          <Group gap={6} wrap="nowrap">
            <IconChevronRight
              size={14}
              aria-hidden
              style={{
                transform: open ? 'rotate(90deg)' : undefined,
                transition: 'transform 120ms',
                flexShrink: 0,
              }}
            />
            <Text size="sm" style={{ flex: 1, minWidth: 0 }}>
              {step.label}
            </Text>
            <Text size="sm" ff="monospace" style={{ whiteSpace: 'nowrap' }}>
              {step.symbol} = {result.text}
            </Text>
          </Group>
        </UnstyledButton>
        {aside}
      </Group>
      <Collapse expanded={open} id={bodyId} keepMounted={false}>
        <Stack gap={2} pl={20} pb={6}>
          <Text size="xs" fw={500}>
            {step.label}
          </Text>
          <Code block fz="xs">
            {step.formula}
            {'\n'}
            {step.substituted}
          </Code>
          <Text size="xs" c="dimmed">
            Reference: {step.reference}
          </Text>
        </Stack>
      </Collapse>
    </Box>
  );
}
