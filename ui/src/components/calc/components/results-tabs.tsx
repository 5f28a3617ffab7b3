import { createContext, lazy, Suspense, useContext, useMemo, type ReactNode } from 'react';
import { Skeleton, Tabs } from '@mantine/core';
import type { CheckDriver, SectionDefinition, SettingBand, SheetEvaluation } from '@holdfast/calc';
import { CheckList, type CheckListProps } from './check-list';
import { DerivationList } from './derivation-list';
import { FieldSettingsView } from './field-settings-view';
import { ResultsTable } from './results-table';
import type { UnitSystem } from '../utils/units';

const EvaluationCharts = lazy(() => import('./evaluation-charts'));

/** The evaluation the open tab shows (the current one, or the last valid one dimmed). */
export const EvaluationShown = createContext<SheetEvaluation | null>(null);

/**
 * Works out the setting bands of a live evaluation (the server stores them with a saved one). It
 * evaluates the sheet once per table row, so it runs only while the field settings tab is open.
 */
export const LiveSettingBands = createContext<
  ((evaluation: SheetEvaluation) => SettingBand[] | undefined) | null
>(null);

function useShown(): SheetEvaluation {
  const shown = useContext(EvaluationShown);
  if (!shown) throw new Error('results tabs rendered without an evaluation');
  return shown;
}

export interface ResultsTabsProps {
  failing: number;
  sections: SectionDefinition[];
  unitSystem: UnitSystem;
  renderCheckAside?: (id: string) => ReactNode;
  renderStepAside?: (id: string) => ReactNode;
  findDrivers?: (checkId: string) => CheckDriver[];
}

/**
 * Checks, results, derivation, charts and field settings in tabs. The panels read the evaluation
 * from `EvaluationShown`, so the tabs themselves can stay one memoised element across keys.
 */
export function ResultsTabs(props: ResultsTabsProps) {
  const { failing, sections, unitSystem } = props;
  return (
    <Tabs defaultValue="checks" keepMounted={false}>
      <Tabs.List mb="sm" style={{ flexWrap: 'wrap' }}>
        <Tabs.Tab value="checks" px="xs">
          Checks {failing > 0 ? `(${failing} failing)` : ''}
        </Tabs.Tab>
        <Tabs.Tab value="results" px="xs">
          Results
        </Tabs.Tab>
        <Tabs.Tab value="steps" px="xs">
          Derivation
        </Tabs.Tab>
        <Tabs.Tab value="charts" px="xs">
          Charts
        </Tabs.Tab>
        <Tabs.Tab value="field" px="xs">
          Field settings
        </Tabs.Tab>
      </Tabs.List>
      <Tabs.Panel value="checks">
        <ShownChecks
          unitSystem={unitSystem}
          renderCheckAside={props.renderCheckAside}
          findDrivers={props.findDrivers}
        />
      </Tabs.Panel>
      <Tabs.Panel value="results">
        <ShownResults sections={sections} unitSystem={unitSystem} />
      </Tabs.Panel>
      <Tabs.Panel value="steps">
        <ShownDerivation
          sections={sections}
          unitSystem={unitSystem}
          renderStepAside={props.renderStepAside}
        />
      </Tabs.Panel>
      <Tabs.Panel value="charts">
        <ShownCharts unitSystem={unitSystem} />
      </Tabs.Panel>
      <Tabs.Panel value="field">
        <ShownFieldSettings unitSystem={unitSystem} />
      </Tabs.Panel>
    </Tabs>
  );
}

function ShownChecks(props: Omit<CheckListProps, 'checks'>) {
  return <CheckList checks={useShown().checks} {...props} />;
}

function ShownResults(props: { sections: SectionDefinition[]; unitSystem: UnitSystem }) {
  return <ResultsTable results={useShown().results} {...props} />;
}

function ShownDerivation(props: {
  sections: SectionDefinition[];
  unitSystem: UnitSystem;
  renderStepAside?: (id: string) => ReactNode;
}) {
  return <DerivationList evaluation={useShown()} {...props} />;
}

function ShownCharts({ unitSystem }: { unitSystem: UnitSystem }) {
  const shown = useShown();
  return (
    <Suspense fallback={<Skeleton h={240} />}>
      <EvaluationCharts charts={shown.charts} unitSystem={unitSystem} />
    </Suspense>
  );
}

function ShownFieldSettings({ unitSystem }: { unitSystem: UnitSystem }) {
  const shown = useShown();
  const live = useContext(LiveSettingBands);
  const bands = useMemo(() => shown.settingBands ?? live?.(shown), [shown, live]);
  return <FieldSettingsView evaluation={shown} bands={bands} unitSystem={unitSystem} />;
}
