import { describe, expect, it } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { getCriteriaSet } from '@holdfast/calc';
import { makeEvaluation } from '../../../testing/fixtures';
import { renderWithProviders } from '../../../testing/render';
import { CriteriaUsed } from './criteria-used';
import { ResultsPanel } from './results-panel';

const general = getCriteriaSet('general-industry')!;

describe('CriteriaUsed', () => {
  it('names the set and, on request, only the values the checks read, in trade units with sources', async () => {
    renderWithProviders(
      <CriteriaUsed criteria={general} used={['pvLimit', 'thrusterForceRatio']} unitSystem="SI" />,
    );
    const box = screen.getByTestId('criteria-used');
    expect(box).toHaveTextContent(`Criteria: ${general.name}, version ${general.version}`);
    await userEvent.click(screen.getByRole('button', { name: /show the 2 values the checks use/ }));
    expect(box).toHaveTextContent(/Lining pressure × rubbing speed limit: 2\.10*\s?MPa·m\/s/);
    expect(box).toHaveTextContent('Thruster force ÷ force needed to release, at least: 1.1');
    expect(box).toHaveTextContent('(common practice');
    expect(box).not.toHaveTextContent('Wheel–rail adhesion');
    expect(box).not.toHaveTextContent('one brake');
  });

  it('says when the checks read no value of the set, and names the set only for an older evaluation', () => {
    const { unmount } = renderWithProviders(
      <CriteriaUsed criteria={general} used={[]} unitSystem="SI" />,
    );
    expect(screen.getByTestId('criteria-used')).toHaveTextContent(
      'its checks read no value of the set',
    );
    unmount();
    renderWithProviders(<CriteriaUsed criteria={general} used={undefined} unitSystem="SI" />);
    const box = screen.getByTestId('criteria-used');
    expect(box).toHaveTextContent(`Criteria: ${general.name}, version ${general.version}`);
    expect(screen.queryByRole('button')).toBeNull();
    expect(box).not.toHaveTextContent('no value');
  });

  it('sits under the results heading when the panel is given the criteria set', () => {
    const evaluation = makeEvaluation({
      sheetType: 'disc-spring-stack',
      criteriaSetId: general.id,
      criteriaSetVersion: general.version,
      criteriaUsed: [],
    });
    renderWithProviders(
      <ResultsPanel
        evaluation={evaluation}
        sections={[]}
        unitSystem="SI"
        origin="test"
        criteria={general}
      />,
    );
    expect(screen.getByTestId('criteria-used')).toHaveTextContent(general.name);
  });
});
