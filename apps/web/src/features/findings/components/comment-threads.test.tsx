import type { TrialDetail } from '@friable/contracts';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { CommentThreads } from './comment-threads';

const trial = { id: 3, code: 'T-1', title: 'Test trial', myRoles: ['reviewer'], mySiteIds: [] } as unknown as TrialDetail;

describe('CommentThreads', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('asks for words before sending an empty comment, then sends the trimmed comment and empties the box', async () => {
    const calls = mockApi({
      'GET /api/trials/3/analyses/9/comments': { status: 200, body: [] },
      'POST /api/trials/3/analyses/9/comments': { status: 201, body: { id: 1, analysisId: 9, parentId: null, body: 'Block 2 looks wetter.', authorId: 7, authorName: 'Ines' } },
    });
    renderWithApp(<CommentThreads trial={trial} analysisId={9} meId={7} />);
    const box = await screen.findByLabelText('Your comment');
    await userEvent.type(box, '   ');
    await userEvent.click(screen.getByRole('button', { name: 'Add the comment' }));
    expect(await screen.findByText('Write the comment first.')).toBeInTheDocument();
    expect(calls.filter((call) => call.method === 'POST')).toHaveLength(0);
    await userEvent.type(box, ' Block 2 looks wetter. ');
    await userEvent.click(screen.getByRole('button', { name: 'Add the comment' }));
    await vi.waitFor(() => expect(calls.find((call) => call.method === 'POST')?.body).toEqual({ body: 'Block 2 looks wetter.' }));
    await vi.waitFor(() => expect(screen.getByLabelText('Your comment')).toHaveValue(''));
  });
});
