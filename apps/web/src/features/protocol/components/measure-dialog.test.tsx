import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { amounts, makeTrial, person } from '../../../test/trial-fixture';
import { ProtocolPage } from './protocol-page';

const base = { 'GET /api/auth/me': { status: 200, body: person }, 'GET /api/trials/3/amounts': { status: 200, body: amounts } };

async function openAddMeasure() {
  await userEvent.click(screen.getByRole('button', { name: 'Add measure' }));
  const dialog = await screen.findByRole('dialog');
  await userEvent.type(within(dialog).getByLabelText('Code'), 'DRAIN2');
  await userEvent.type(within(dialog).getByLabelText('Name'), 'Drain time, second hole');
  return dialog;
}

describe('MeasureDialog', () => {
  beforeEach(() => window.localStorage.setItem('friable.signedIn', '1'));
  afterEach(() => vi.unstubAllGlobals());

  it('asks which way is better with neither answer chosen, answers “lower” for a time until the person answers, and reads a decimal comma', async () => {
    const calls = mockApi({ ...base, 'POST /api/trials/3/measures': { status: 201, body: {} }, 'GET /api/trials/3': { status: 200, body: makeTrial() } });
    renderWithApp(<ProtocolPage trial={makeTrial()} />);
    const dialog = await openAddMeasure();
    expect(within(dialog).getByLabelText('Higher is better')).not.toBeChecked();
    expect(within(dialog).getByLabelText('Lower is better')).not.toBeChecked();
    await userEvent.selectOptions(within(dialog).getByLabelText('Kind'), 'time-with-cutoff');
    expect(within(dialog).getByLabelText('Lower is better')).toBeChecked();
    await userEvent.selectOptions(within(dialog).getByLabelText('Kind'), 'continuous');
    expect(within(dialog).getByLabelText('Lower is better')).not.toBeChecked();
    await userEvent.click(within(dialog).getByLabelText('Higher is better'));
    await userEvent.selectOptions(within(dialog).getByLabelText('Kind'), 'time-with-cutoff');
    expect(within(dialog).getByLabelText('Higher is better')).toBeChecked();
    await userEvent.type(within(dialog).getByLabelText('Cut-off'), '600');
    await userEvent.type(within(dialog).getByLabelText('Plausible minimum'), '0,5');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Add measure' }));
    await waitFor(() => expect(calls.find((c) => c.method === 'POST')?.body).toEqual({
      code: 'DRAIN2',
      name: 'Drain time, second hole',
      unit: 's',
      kind: 'time-with-cutoff',
      scaleMin: null,
      scaleMax: null,
      cutoff: 600,
      plausibleMin: 0.5,
      plausibleMax: null,
      hardMin: null,
      hardMax: null,
      decimals: 1,
      higherIsBetter: true,
    }));
  });

  it('sends no direction when none is chosen, so the server’s refusal can stand beside the question', async () => {
    const calls = mockApi({
      ...base,
      'POST /api/trials/3/measures': {
        status: 422,
        body: { statusCode: 422, error: 'Unprocessable Entity', message: 'The measure was not saved.', errors: [{ field: 'higherIsBetter', message: 'Say which way is better for this measure.' }] },
      },
    });
    renderWithApp(<ProtocolPage trial={makeTrial()} />);
    const dialog = await openAddMeasure();
    await userEvent.click(within(dialog).getByRole('button', { name: 'Add measure' }));
    const message = await within(dialog).findByText('Say which way is better for this measure.');
    expect(message.closest('.bp6-form-group')).toContainElement(within(dialog).getByLabelText('Higher is better'));
    expect(calls.find((c) => c.method === 'POST')?.body).not.toHaveProperty('higherIsBetter');
  });

  it('refuses a range that is not a number beside its box, before asking the server', async () => {
    const calls = mockApi(base);
    renderWithApp(<ProtocolPage trial={makeTrial()} />);
    const dialog = await openAddMeasure();
    await userEvent.type(within(dialog).getByLabelText('Hard maximum'), 'lots');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Add measure' }));
    const message = await within(dialog).findByText('Hard maximum must be a number, e.g. 12.5');
    expect(message.closest('.bp6-form-group')).toContainElement(within(dialog).getByLabelText('Hard maximum'));
    expect(calls.some((c) => c.method === 'POST')).toBe(false);
  });
});
