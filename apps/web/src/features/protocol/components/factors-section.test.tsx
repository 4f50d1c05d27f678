import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { makeTrial, person } from '../../../test/trial-fixture';
import { FactorsSection } from './factors-section';

const base = { 'GET /api/auth/me': { status: 200, body: person } };

async function fillFactor(group: HTMLElement, name: string, levels: Array<[string, string, string?]>) {
  await userEvent.type(within(group).getByLabelText('Factor name'), name);
  for (const [index, [code, levelName, rate]] of levels.entries()) {
    if (index >= 2) await userEvent.click(within(group).getByRole('button', { name: 'Add a level' }));
    await userEvent.type(within(group).getByLabelText(`Level ${index + 1} code`), code);
    await userEvent.type(within(group).getByLabelText(`Level ${index + 1} name`), levelName);
    if (rate) {
      await userEvent.type(within(group).getByLabelText(`Level ${index + 1} rate`), rate);
      await userEvent.selectOptions(within(group).getByLabelText(`Level ${index + 1} rate unit`), 'cm');
    }
  }
}

describe('FactorsSection', () => {
  beforeEach(() => window.localStorage.setItem('friable.accessToken', 'token'));
  afterEach(() => vi.unstubAllGlobals());

  it('asks a split plot for its whole-plot factor first, then its sub-plot factor, and sends each level with its rate', async () => {
    const calls = mockApi({ ...base, 'PUT /api/trials/3/factors': { status: 200, body: { factors: [], treatments: [] } }, 'GET /api/trials/3': { status: 200, body: makeTrial() } });
    renderWithApp(<FactorsSection trial={makeTrial({ design: 'split-plot', factors: [], treatments: [] })} canEdit />);
    expect(screen.getByText(/A split plot puts the whole-plot factor on whole beds/)).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Edit factors' }));
    const dialog = screen.getByRole('dialog');
    const whole = within(dialog).getByRole('group', { name: /^Whole-plot factor — applied on whole plots/ });
    const sub = within(dialog).getByRole('group', { name: /^Sub-plot factor — applied on sub plots/ });
    // A split plot takes exactly two factors: no button to add a third.
    expect(within(dialog).queryByRole('button', { name: 'Add a factor' })).toBeNull();
    await fillFactor(whole, 'Compost', [['N', 'None'], ['C', 'Compost', '2.5']]);
    await fillFactor(sub, 'Mulch', [['B', 'Bare'], ['S', 'Straw', '5'], ['W', 'Woodchip', '5']]);
    await userEvent.click(within(dialog).getByRole('button', { name: 'Save factors' }));
    await waitFor(() => expect(calls.some((c) => c.method === 'PUT')).toBe(true));
    const sent = calls.find((c) => c.method === 'PUT')!.body as { factors: Array<{ name: string; levels: Array<Record<string, unknown>> }> };
    expect(sent.factors.map((f) => [f.name, f.levels.map((l) => [l.code, l.name, l.rateValue, l.rateUnit])])).toEqual([
      ['Compost', [['N', 'None', null, null], ['C', 'Compost', 2.5, 'cm']]],
      ['Mulch', [['B', 'Bare', null, null], ['S', 'Straw', 5, 'cm'], ['W', 'Woodchip', 5, 'cm']]],
    ]);
  });

  it('lets a factorial add a third and fourth factor, and shows the server’s refusal beside the level it names', async () => {
    mockApi({
      ...base,
      'PUT /api/trials/3/factors': {
        status: 422,
        body: { statusCode: 422, error: 'Unprocessable Entity', message: 'The factors were not saved.', errors: [{ field: 'factors.2.levels.1.code', message: 'code must be 1 to 6 letters or digits' }] },
      },
    });
    renderWithApp(<FactorsSection trial={makeTrial({ design: 'factorial-rcbd', factors: [], treatments: [] })} canEdit />);
    await userEvent.click(screen.getByRole('button', { name: 'Edit factors' }));
    const dialog = screen.getByRole('dialog');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Add a factor' }));
    await userEvent.click(within(dialog).getByRole('button', { name: 'Add a factor' }));
    expect(within(dialog).getAllByRole('group').map((g) => g.querySelector('legend')?.textContent?.split(' — ')[0])).toEqual(['Factor A', 'Factor B', 'Factor C', 'Factor D']);
    expect(within(dialog).queryByRole('button', { name: 'Add a factor' })).toBeNull();
    await userEvent.click(within(dialog).getByRole('button', { name: 'Save factors' }));
    expect(await within(dialog).findByText('code must be 1 to 6 letters or digits')).toBeInTheDocument();
  });
});
