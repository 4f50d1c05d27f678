import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { afterEach, describe, expect, it } from 'vitest';
import { setAccountLocale } from '../lib/person-locale';
import { NumberText } from './number-text';

function Box({ start = '' }: { start?: string }) {
  const [text, setText] = useState(start);
  return (
    <>
      <label htmlFor="box">Rate</label>
      <NumberText id="box" value={text} onChange={setText} />
      <button type="button">elsewhere</button>
    </>
  );
}

describe('NumberText', () => {
  afterEach(() => setAccountLocale(null));

  it('writes a decimal comma back as the person’s decimal point when they leave the box', async () => {
    render(<Box />);
    await userEvent.type(screen.getByLabelText('Rate'), '0,5');
    await userEvent.click(screen.getByRole('button', { name: 'elsewhere' }));
    expect(screen.getByLabelText('Rate')).toHaveValue('0.5');
  });

  it('follows the account’s locale: a decimal comma for someone whose account says de-DE', async () => {
    setAccountLocale('de-DE');
    render(<Box />);
    await userEvent.type(screen.getByLabelText('Rate'), '1 234.5');
    await userEvent.click(screen.getByRole('button', { name: 'elsewhere' }));
    expect(screen.getByLabelText('Rate')).toHaveValue('1234,5');
    // For them 1,000 is one (their own decimal mark), but 1.000 is asked about.
    await userEvent.clear(screen.getByLabelText('Rate'));
    await userEvent.type(screen.getByLabelText('Rate'), '1.000');
    expect(screen.getByRole('group', { name: 'What does 1.000 mean?' })).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: '1,000 (decimals)' }));
    expect(screen.getByLabelText('Rate')).toHaveValue('1,000');
    expect(screen.queryByRole('group')).not.toBeInTheDocument();
  });

  it('says when the text is not a number, and marks the box', async () => {
    render(<Box start="12 kg" />);
    expect(screen.getByText(/Not a number Friable can read/)).toBeInTheDocument();
    expect(screen.getByLabelText('Rate')).toHaveAttribute('aria-invalid', 'true');
  });

  it('leaves an ambiguous entry alone when the box is left, until the person answers', async () => {
    render(<Box />);
    await userEvent.type(screen.getByLabelText('Rate'), '2,500');
    await userEvent.click(screen.getByRole('button', { name: 'elsewhere' }));
    expect(screen.getByLabelText('Rate')).toHaveValue('2,500');
    await userEvent.click(screen.getByRole('button', { name: '2,500 (thousands)' }));
    expect(screen.getByLabelText('Rate')).toHaveValue('2500');
  });
});
