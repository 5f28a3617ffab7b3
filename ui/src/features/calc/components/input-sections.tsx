import type { ReactNode } from 'react';
import { Box, Paper, SimpleGrid, Stack, Title } from '@mantine/core';
import type { InputValue, SheetInputs, SheetTypeDefinition } from '@holdfast/calc';
import { FieldInput } from './field-input';
import type { UnitSystem } from '../utils/units';

export interface InputSectionsProps {
  sheetType: SheetTypeDefinition;
  inputs: SheetInputs;
  onChange: (key: string, value: InputValue) => void;
  unitSystem: UnitSystem;
  /** Field key → message (calc core or server). */
  errors?: Record<string, string>;
  readOnly?: boolean;
  /** Drawn at the top right of a field, e.g. a comment marker. */
  renderFieldAside?: (key: string) => ReactNode;
}

/** The sheet type's inputs, grouped by its sections in their declared order. */
export function InputSections(props: InputSectionsProps) {
  const {
    sheetType,
    inputs,
    onChange,
    unitSystem,
    errors = {},
    readOnly,
    renderFieldAside,
  } = props;
  return (
    <Stack gap="md">
      {sheetType.sections.map((section) => {
        const fields = sheetType.fields.filter((f) => f.section === section.id);
        if (fields.length === 0) return null;
        return (
          <Paper
            key={section.id}
            p="md"
            component="section"
            aria-labelledby={`section-${section.id}`}
          >
            <Title order={3} size="h5" mb="sm" id={`section-${section.id}`}>
              {section.title}
            </Title>
            <SimpleGrid cols={{ base: 1, xl: 2 }} spacing="md" verticalSpacing="sm">
              {fields.map((field) => (
                <Box
                  key={field.key}
                  pos="relative"
                  data-field={field.key}
                  pr={renderFieldAside ? 28 : undefined}
                >
                  <FieldInput
                    field={field}
                    value={inputs[field.key]}
                    onChange={onChange}
                    unitSystem={unitSystem}
                    error={errors[field.key]}
                    readOnly={readOnly}
                  />
                  {renderFieldAside ? (
                    <Box pos="absolute" top={0} right={0}>
                      {renderFieldAside(field.key)}
                    </Box>
                  ) : null}
                </Box>
              ))}
            </SimpleGrid>
          </Paper>
        );
      })}
    </Stack>
  );
}
