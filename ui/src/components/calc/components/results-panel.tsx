import { memo, useMemo, type ReactNode } from 'react';
import { Alert, Badge, Box, Group, Paper, Skeleton, Stack, Text, Title } from '@mantine/core';
import { IconAlertTriangle, IconBolt } from '@tabler/icons-react';
import type { CheckDriver, CriteriaSet, SectionDefinition, SheetEvaluation } from '@holdfast/calc';
import { CheckDriversButton } from './check-drivers-button';
import { CriteriaUsed } from './criteria-used';
import { CalculationNotes } from './calculation-notes';
import { EvaluationShown, ResultsTabs } from './results-tabs';
import { Verdict } from './verdict';
import type { UnitSystem } from '../utils/units';

export interface ResultsPanelProps {
  evaluation: SheetEvaluation | null;
  /** Shown dimmed when the current inputs cannot be evaluated. */
  stale?: SheetEvaluation | null;
  sections: SectionDefinition[];
  unitSystem: UnitSystem;
  /** Live recalculation time; omitted when showing a stored evaluation. */
  durationMs?: number;
  /** Where the numbers come from, e.g. 'Calculated live in your browser' or 'Stored at submission'. */
  origin: string;
  failure?: string | null;
  invalidCount?: number;
  renderCheckAside?: (id: string) => ReactNode;
  renderStepAside?: (id: string) => ReactNode;
  /** The inputs that drive a check; failing checks then link to them. */
  findDrivers?: (checkId: string) => CheckDriver[];
  /** The criteria set the evaluation was made against: named, with the values its checks use. */
  criteria?: CriteriaSet;
}

/**
 * Checks, results, derivation, charts and field settings of one evaluation, in tabs; the failing
 * checks are listed above the tabs so they stay in sight whichever tab is open. Memoised: it
 * renders again only when the evaluation (or its presentation) changes.
 */
export const ResultsPanel = memo(function ResultsPanel(props: ResultsPanelProps) {
  const {
    evaluation,
    stale,
    sections,
    unitSystem,
    durationMs,
    origin,
    failure,
    invalidCount = 0,
  } = props;
  const shown = evaluation ?? stale ?? null;
  const failingChecks = shown ? shown.checks.filter((c) => !c.pass) : [];
  const failing = failingChecks.length;
  const { renderCheckAside, renderStepAside, findDrivers } = props;
  // The tabs are one memoised element: a new evaluation reaches the open panel through context,
  // so a key renders the panel's rows, not the five tabs, their buttons and panels.
  const tabs = useMemo(
    () => (
      <ResultsTabs
        failing={failing}
        sections={sections}
        unitSystem={unitSystem}
        renderCheckAside={renderCheckAside}
        renderStepAside={renderStepAside}
        findDrivers={findDrivers}
      />
    ),
    [failing, sections, unitSystem, renderCheckAside, renderStepAside, findDrivers],
  );
  return (
    <Paper
      p="md"
      component="section"
      aria-labelledby="results-title"
      aria-live="polite"
      aria-busy={false}
    >
      <Group justify="space-between" mb="xs" wrap="nowrap">
        <Title order={2} size="h4" id="results-title">
          Results
        </Title>
        {shown && evaluation ? <Verdict pass={shown.pass} size="lg" /> : null}
      </Group>
      <Group gap="xs" mb="sm">
        <Text size="xs" c="dimmed">
          {origin}
        </Text>
        {durationMs !== undefined ? (
          <Badge
            variant="outline"
            color="gray"
            size="sm"
            leftSection={<IconBolt size={12} aria-hidden />}
            data-testid="recalc-time"
          >
            {durationMs.toFixed(1)} ms
          </Badge>
        ) : null}
        {shown ? (
          <Text size="xs" c="dimmed" data-testid="check-count">
            {/* While an input is not valid the count is the last valid inputs', and says so. */}
            {evaluation
              ? `${shown.checks.length - failing} of ${shown.checks.length} checks pass`
              : `with the last valid inputs ${shown.checks.length - failing} of ${shown.checks.length} checks passed`}{' '}
            · core {shown.coreVersion}
          </Text>
        ) : null}
      </Group>
      {shown && props.criteria ? (
        <Box mt={-6} mb="sm">
          <CriteriaUsed
            criteria={props.criteria}
            used={shown.criteriaUsed}
            unitSystem={unitSystem}
          />
        </Box>
      ) : null}
      {evaluation && failing > 0 ? (
        <Box
          component="ul"
          aria-label="Failing checks"
          p={0}
          m={0}
          mb="sm"
          style={{ listStyle: 'none' }}
          data-testid="failing-summary"
        >
          {failingChecks.map((c) => (
            <FailingRow
              key={c.id}
              id={c.id}
              label={c.label}
              percent={Math.round(c.utilisation * 100)}
              findDrivers={props.findDrivers}
            />
          ))}
        </Box>
      ) : null}
      {invalidCount > 0 ? (
        <Alert
          color="amber"
          variant="light"
          icon={<IconAlertTriangle size={18} />}
          mb="sm"
          title="Some inputs need attention"
        >
          {invalidCount === 1 ? 'One input is' : `${invalidCount} inputs are`} not valid (marked
          beside the field).
          {stale ? ' The results below are from the last valid inputs.' : ''}
        </Alert>
      ) : null}
      {failure ? (
        <Alert
          color="fail"
          variant="light"
          icon={<IconAlertTriangle size={18} />}
          mb="sm"
          title="The calculation stopped"
        >
          {failure}
        </Alert>
      ) : null}
      {!shown ? (
        <Stack gap="xs">
          <Skeleton h={56} />
          <Skeleton h={56} />
          <Skeleton h={56} />
        </Stack>
      ) : (
        <Box style={{ opacity: evaluation ? 1 : 0.55 }}>
          <CalculationNotes warnings={shown.warnings} />
          <EvaluationShown.Provider value={shown}>{tabs}</EvaluationShown.Provider>
        </Box>
      )}
    </Paper>
  );
});

/** One failing check in the summary; renders again only when its rounded share of the limit moves. */
const FailingRow = memo(function FailingRow(props: {
  id: string;
  label: string;
  percent: number;
  findDrivers?: (checkId: string) => CheckDriver[];
}) {
  return (
    <Group component="li" gap={6} wrap="nowrap" justify="space-between" data-failing={props.id}>
      {/* A failing check is read in full: the row wraps rather than cutting its words off. */}
      <Text size="sm" c="fail.8" fw={600} style={{ flex: 1, minWidth: 0 }}>
        ✕ {props.label} ({props.percent} % of limit)
      </Text>
      {props.findDrivers ? (
        <CheckDriversButton label={props.label} checkId={props.id} find={props.findDrivers} />
      ) : null}
    </Group>
  );
});
