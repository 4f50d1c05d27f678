import type { ActivityEntry } from '@friable/contracts';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { makeTrial, person } from '../../../test/trial-fixture';
import { ActivityPage } from './activity-page';

const me = { status: 200, body: person };
const people = [
  { userId: 7, name: 'Ines Marlow' },
  { userId: 8, name: 'Tomas Reed' },
];

const entry = (id: number, at: string, kind: string, summary: string, extra: Partial<ActivityEntry> = {}): ActivityEntry => ({
  id,
  at,
  userId: 7,
  userName: 'Ines Marlow',
  kind,
  siteId: null,
  summary,
  details: {},
  ...extra,
});

// Newest first, as the API answers.
const trail: ActivityEntry[] = [
  entry(5, '2026-11-24T15:10:00.000Z', 'intake.committed', 'Committed 12 values for Hollow Lane, Week 2 from day14.csv.', { userId: 8, userName: 'Tomas Reed', siteId: 31 }),
  entry(4, '2026-11-20T09:00:00.000Z', 'site.randomized', 'Randomized Hollow Lane with seed clay-2026.', { siteId: 31 }),
  entry(3, '2026-11-19T11:30:00.000Z', 'treatment.updated', 'Changed treatment G40: rate 30 → 40 lb/1000 ft².'),
  entry(2, '2026-11-19T11:00:00.000Z', 'treatment.created', 'Added treatment G40 (Gypsum).'),
  entry(1, '2026-11-18T08:00:00.000Z', 'trial.created', 'Created the trial CLAY-T.', { userId: null, userName: null }),
];

describe('ActivityPage', () => {
  beforeEach(() => window.localStorage.setItem('friable.signedIn', '1'));
  afterEach(() => vi.unstubAllGlobals());

  it('lists the changes newest first as sentences with who, where, what kind and when', async () => {
    mockApi({ 'GET /api/auth/me': me, 'GET /api/trials/3/activity': { status: 200, body: trail } });
    renderWithApp(<ActivityPage trial={makeTrial()} people={people} />, { route: '/trials/3/activity' });
    const list = await screen.findByRole('list', { name: 'Changes, newest first' });
    const items = within(list).getAllByRole('listitem');
    expect(items.map((item) => within(item).getByText(/\.$/, { selector: 'p' }).textContent)).toEqual(trail.map((e) => e.summary));
    expect(within(items[0]!).getByText('Upload committed')).toBeInTheDocument();
    expect(within(items[0]!).getByText('by Tomas Reed')).toBeInTheDocument();
    expect(within(items[0]!).getByText('at Hollow Lane')).toBeInTheDocument();
    expect(within(items[4]!).getByText('by Friable')).toBeInTheDocument();
    expect(within(items[4]!).getByText('Trial created')).toBeInTheDocument();
    // A moment for people, in the browser's time zone: "Tue, 24 Nov 2026, 15:10" in UTC.
    const when = items[0]!.querySelector('time')!;
    expect(when).toHaveAttribute('dateTime', '2026-11-24T15:10:00.000Z');
    expect(when.textContent).toMatch(/^\w{3}, 2[45] Nov 2026, \d\d:\d\d$/);
    expect(screen.getByText('5 changes, newest first.')).toBeInTheDocument();
  });

  it('asks the API for one person, one site and one exact kind, and narrows a whole group itself', async () => {
    const calls = mockApi({
      'GET /api/auth/me': me,
      'GET /api/trials/3/activity': { status: 200, body: trail },
      'GET /api/trials/3/activity?userId=7': { status: 200, body: trail.filter((e) => e.userId === 7) },
      'GET /api/trials/3/activity?siteId=31&userId=7': { status: 200, body: [trail[1]] },
      'GET /api/trials/3/activity?kind=treatment.created&userId=7': { status: 200, body: [trail[3]] },
    });
    renderWithApp(<ActivityPage trial={makeTrial()} people={people} />, { route: '/trials/3/activity' });
    await screen.findByRole('list', { name: 'Changes, newest first' });

    await userEvent.selectOptions(screen.getByLabelText('Person'), 'Ines Marlow');
    await screen.findByText('3 changes matching the filters, newest first.');
    await userEvent.selectOptions(screen.getByLabelText('Site'), 'Hollow Lane');
    expect(await screen.findByText('Randomized Hollow Lane with seed clay-2026.')).toBeInTheDocument();
    await userEvent.selectOptions(screen.getByLabelText('Site'), 'All sites');

    // A whole group: the API has no prefix filter, so the person's entries are narrowed here.
    await userEvent.selectOptions(screen.getByLabelText('Kind of change'), 'All: treatments');
    const list = await screen.findByRole('list', { name: 'Changes, newest first' });
    await vi.waitFor(() => expect(within(list).getAllByRole('listitem')).toHaveLength(2));
    expect(within(list).queryByText('Randomized Hollow Lane with seed clay-2026.')).not.toBeInTheDocument();

    // One exact kind goes to the API.
    await userEvent.selectOptions(screen.getByLabelText('Kind of change'), 'Treatment added');
    await vi.waitFor(() => expect(within(screen.getByRole('list', { name: 'Changes, newest first' })).getAllByRole('listitem')).toHaveLength(1));

    // Each filter asked once (a return to an earlier filter may ask again).
    expect([...new Set(calls.map((call) => call.path).filter((path) => path.includes('/activity')))]).toEqual([
      '/api/trials/3/activity',
      '/api/trials/3/activity?userId=7',
      '/api/trials/3/activity?siteId=31&userId=7',
      '/api/trials/3/activity?kind=treatment.created&userId=7',
    ]);
  });

  it('says in words when nothing has happened, and when nothing matches the filters', async () => {
    mockApi({
      'GET /api/auth/me': me,
      'GET /api/trials/3/activity': { status: 200, body: [] },
      'GET /api/trials/3/activity?siteId=32': { status: 200, body: [] },
    });
    renderWithApp(<ActivityPage trial={makeTrial()} people={people} />, { route: '/trials/3/activity' });
    expect(await screen.findByText('No activity yet')).toBeInTheDocument();
    await userEvent.selectOptions(screen.getByLabelText('Site'), 'Millbrook');
    expect(await screen.findByText('No changes match')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Show all changes' }));
    expect(await screen.findByText('No activity yet')).toBeInTheDocument();
  });
});
