import { describe, expect, it } from 'vitest';
import { useState } from 'react';
import { act, fireEvent, screen } from '@testing-library/react';
import type { Revision } from '@holdfast/shared';
import { renderWithProviders } from '../../../testing/render';
import { mockFetch } from '../../../testing/mock-fetch';
import { testUsers } from '../../../testing/fixtures';
import {
  fixtureCriteria,
  leverBrakeFixture,
} from '../../../components/calc/testing/lever-brake-fixture';
import { makeRevision } from '../testing-revision';
import { RevisionWorkbench } from './revision-workbench';

/**
 * What a key and an autosave render. Every field and check row carries a comment marker (a
 * tooltip and a popover); rendering them all again on each key or each save answered a key in
 * 30–100 ms instead of one frame. Counted, not timed: the counts hold on a loaded machine.
 */
describe('RevisionWorkbench render work', () => {
  it('a key renders no marker, and a saved copy of the revision renders none either', () => {
    mockFetch({});
    const asides: string[] = [];
    const aside = (key: string) => {
      asides.push(key);
      return <span data-aside={key} />;
    };
    let setRevision: (r: Revision) => void = () => undefined;
    function Page() {
      const [revision, set] = useState(makeRevision);
      setRevision = set;
      return (
        <RevisionWorkbench
          revision={revision}
          sheetType={leverBrakeFixture}
          criteria={fixtureCriteria}
          renderFieldAside={aside}
          renderCheckAside={aside}
          renderStepAside={aside}
        />
      );
    }
    renderWithProviders(<Page />, { user: testUsers.engineer });
    const fields = leverBrakeFixture.fields.length;
    expect(asides.length).toBeGreaterThanOrEqual(fields);
    asides.length = 0;

    const force = screen.getByRole('textbox', { name: /Spring force/ });
    for (const value of ['5', '50', '500', '5000']) fireEvent.change(force, { target: { value } });
    expect(asides).toEqual([]);

    // What the revision query holds after an autosave: the same revision, a new object.
    act(() => setRevision(makeRevision({ rowVersion: 9, inputs: { ...makeRevision().inputs } })));
    expect(asides).toEqual([]);
  });
});
