import { memo, type ReactNode } from 'react';
import { Badge, Box, Button, Group, Paper, SimpleGrid, Stack, Title } from '@mantine/core';
import { Aside } from './aside';
import type {
  FieldDefinition,
  InputValue,
  SectionDefinition,
  SheetInputs,
  SheetTypeDefinition,
} from '@holdfast/calc';
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
  /** Fields holding an example or copied value nobody has confirmed yet. */
  unconfirmed?: ReadonlySet<string>;
  onConfirm?: (keys: string[]) => void;
}

const NO_ERRORS: Record<string, string> = {};

/**
 * The sheet type's inputs, grouped by its sections in their declared order. Each field row is
 * memoised on its own value and message, so a keystroke renders one row, not sixty.
 */
export function InputSections(props: InputSectionsProps) {
  const { sheetType, errors = NO_ERRORS, unconfirmed } = props;
  return (
    <Stack gap="md">
      {sheetType.sections.map((section) => {
        const fields = sheetType.fields.filter((f) => f.section === section.id);
        if (fields.length === 0) return null;
        return (
          <SectionCard
            key={section.id}
            {...props}
            section={section}
            fields={fields}
            errors={errors}
            unconfirmed={unconfirmed}
          />
        );
      })}
    </Stack>
  );
}

interface SectionCardProps extends InputSectionsProps {
  section: SectionDefinition;
  fields: FieldDefinition[];
  errors: Record<string, string>;
}

/**
 * One section of inputs. It renders again only when one of its own fields changed value, message
 * or confirmation: typing in one section leaves the other sections alone.
 */
const SectionCard = memo(function SectionCard(props: SectionCardProps) {
  const { section, fields, inputs, errors, unconfirmed } = props;
  return (
    <Paper p="md" component="section" aria-labelledby={`section-${section.id}`}>
      <Title order={3} size="h5" mb="sm" id={`section-${section.id}`}>
        {section.title}
      </Title>
      <SimpleGrid cols={{ base: 1, xl: 2 }} spacing="md" verticalSpacing="sm">
        {fields.map((field) => (
          <FieldRow
            key={field.key}
            field={field}
            value={inputs[field.key]}
            error={errors[field.key]}
            onChange={props.onChange}
            unitSystem={props.unitSystem}
            readOnly={props.readOnly}
            renderAside={props.renderFieldAside}
            unconfirmed={unconfirmed?.has(field.key) ?? false}
            onConfirm={props.onConfirm}
          />
        ))}
      </SimpleGrid>
    </Paper>
  );
}, sameSection);

function sameSection(a: SectionCardProps, b: SectionCardProps): boolean {
  if (
    a.section !== b.section ||
    a.onChange !== b.onChange ||
    a.unitSystem !== b.unitSystem ||
    a.readOnly !== b.readOnly ||
    a.renderFieldAside !== b.renderFieldAside ||
    a.onConfirm !== b.onConfirm ||
    a.fields.length !== b.fields.length
  )
    return false;
  return a.fields.every(
    (f, k) =>
      f === b.fields[k] &&
      a.inputs[f.key] === b.inputs[f.key] &&
      a.errors[f.key] === b.errors[f.key] &&
      (a.unconfirmed?.has(f.key) ?? false) === (b.unconfirmed?.has(f.key) ?? false),
  );
}

interface FieldRowProps {
  field: FieldDefinition;
  value: InputValue | undefined;
  error: string | undefined;
  onChange: (key: string, value: InputValue) => void;
  unitSystem: UnitSystem;
  readOnly?: boolean;
  renderAside?: (key: string) => ReactNode;
  unconfirmed: boolean;
  onConfirm?: (keys: string[]) => void;
}

/** Longest choice label (characters) that still reads whole in one column of the two-column grid. */
const NARROW_CHOICE = 26;

/** A choice field whose options are written out in words takes the whole row, so none is cut off. */
function wideChoice(field: FieldDefinition): boolean {
  return (field.choices ?? []).some((c) => c.label.length > NARROW_CHOICE);
}

const FieldRow = memo(function FieldRow(props: FieldRowProps) {
  const { field, renderAside, unconfirmed } = props;
  const wide = wideChoice(field);
  return (
    <Box
      pos="relative"
      data-field={field.key}
      data-unconfirmed={unconfirmed || undefined}
      // The marker sits on the label line; a select box below it may use the full width.
      pr={renderAside && !wide ? 28 : undefined}
      style={wide ? { gridColumn: '1 / -1' } : undefined}
    >
      <FieldInput
        field={field}
        value={props.value}
        onChange={props.onChange}
        unitSystem={props.unitSystem}
        error={props.error}
        readOnly={props.readOnly}
      />
      {unconfirmed ? (
        <Group gap={6} mt={4} wrap="nowrap">
          <Badge color="amber" variant="light" size="sm" radius="sm">
            Not confirmed
          </Badge>
          {props.onConfirm ? (
            <Button
              size="compact-xs"
              variant="subtle"
              color="steel"
              onClick={() => props.onConfirm?.([field.key])}
              aria-label={`Confirm ${field.label}`}
            >
              Confirm value
            </Button>
          ) : null}
        </Group>
      ) : null}
      {renderAside ? (
        <Box pos="absolute" top={0} right={0}>
          <Aside id={field.key} render={renderAside} />
        </Box>
      ) : null}
    </Box>
  );
});
