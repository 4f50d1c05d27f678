import { blocksForPower, rcbdPower } from '@friable/stats';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { jsonReply, readRequest, renderWithApp } from '../../../test/render';
import { PlannerPage } from './planner-page';

// Plotly needs a real browser; the curve's points are what this page hands it.
vi.mock('./power-curve', () => ({
  default: ({ points, recommended }: { points: Array<{ blocks: number }>; recommended: number | null }) => (
    <div data-testid="power-curve">
      curve of {points.length} points from {points[0]?.blocks} to {points.at(-1)?.blocks}, marked at {recommended}
    </div>
  ),
}));

const person = { id: 9, email: 'p@example.org', name: 'Priya Vance', isAdmin: false, isActive: true, createdAt: '2026-11-01T00:00:00.000Z' };

type PowerBody = { treatments: number; cv: number; difference: number; alpha: number; sites: number; blocks?: number; targetPower?: number };

/**
 * A stand-in for POST /api/stats/power that answers with the same engine the API uses
 * (libs/stats, itself checked against R's noncentral F in power.test.ts), recording every body.
 */
function powerServer(refuse?: { status: number; body: unknown }, reads: Record<string, unknown> = {}) {
  const bodies: PowerBody[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const reply = jsonReply;
      const seen = await readRequest(input, init);
      if (seen.path === '/api/auth/me') return reply(200, person);
      if (seen.path in reads) return reply(200, reads[seen.path]);
      if (seen.path !== '/api/stats/power' || seen.method !== 'POST') return reply(404, { message: 'no such mock' });
      const body = seen.body as PowerBody;
      bodies.push(body);
      if (refuse) return reply(refuse.status, refuse.body);
      if (body.blocks !== undefined) return reply(200, { ...rcbdPower({ ...body, blocks: body.blocks }), blocks: body.blocks });
      return reply(200, blocksForPower({ ...body, targetPower: body.targetPower! }));
    }),
  );
  return bodies;
}

async function setBox(label: string, text: string) {
  const box = screen.getByLabelText(label);
  await userEvent.clear(box);
  if (text) await userEvent.type(box, text);
}

async function fill(values: Record<string, string>) {
  for (const [label, text] of Object.entries(values)) await setBox(label, text);
  await userEvent.click(screen.getByRole('button', { name: 'Work out the blocks' }));
}

describe('PlannerPage', () => {
  beforeEach(() => window.localStorage.setItem('friable.signedIn', '1'));
  afterEach(() => vi.unstubAllGlobals());

  it('asks for the blocks needed, then the power at each number of blocks, and shows the recommendation and curve', async () => {
    const bodies = powerServer();
    renderWithApp(<PlannerPage />);
    await fill({ Treatments: '5', Sites: '1', CV: '12', Difference: '15', 'Significance level': '0.05', 'Target power': '0.6' });

    // libs/stats power.test.ts (R 4.2.2): t = 5, CV 12 %, δ 15 %, α 0.05 reaches power 0.6 first at 12 blocks, power 0.6306.
    const result = within(screen.getByText('Blocks per site').closest('.fr-result-card') as HTMLElement);
    expect(await result.findByText('12')).toBeInTheDocument();
    expect(result.getByText(/Power 63% with 12 blocks at one site: 60 plots in all, 44 error degrees of freedom per site/)).toBeInTheDocument();
    expect(bodies[0]).toEqual({ treatments: 5, cv: 12, difference: 15, alpha: 0.05, sites: 1, targetPower: 0.6 });

    // The curve runs from 2 to 12 + 4 blocks, one request per point, each with the same question.
    expect(await screen.findByTestId('power-curve')).toHaveTextContent('curve of 15 points from 2 to 16, marked at 12');
    const pointBodies = bodies.filter((body) => body.blocks !== undefined);
    expect(pointBodies.map((body) => body.blocks)).toEqual(Array.from({ length: 15 }, (_, i) => i + 2));
    expect(pointBodies.every((body) => body.treatments === 5 && body.cv === 12 && body.difference === 15 && body.alpha === 0.05 && body.sites === 1 && !('targetPower' in body))).toBe(true);

    // R 4.2.2 (power.test.ts): b = 2 → 0.0838, b = 11 → 0.5824.
    const table = within(screen.getByRole('table', { name: 'Power at each number of blocks' }));
    expect(table.getByRole('row', { name: '2 8% 4' })).toBeInTheDocument();
    expect(table.getByRole('row', { name: '11 58% 40' })).toBeInTheDocument();
    expect(table.getByRole('row', { name: '12 (recommended) 63% 44' })).toBeInTheDocument();
    expect(screen.queryByText(/error degrees of freedom; at least 12/)).not.toBeInTheDocument();
  });

  it('warns when the recommended blocks leave fewer than 12 error degrees of freedom per site', async () => {
    const bodies = powerServer();
    renderWithApp(<PlannerPage />);
    await fill({ Treatments: '4', Sites: '2', CV: '10', Difference: '30', 'Target power': '0.8' });
    // Error df per site (t − 1)(b − 1): the sites are pooled for power, but each site's own analysis keeps 3 × (b − 1).
    expect(bodies[0]).toEqual({ treatments: 4, cv: 10, difference: 30, alpha: 0.05, sites: 2, targetPower: 0.8 });
    // R 4.2.2: 1 - pf(qf(0.95, 3, 2*3*1), 3, 6, ncp = 2*2*(30/10)^2/2) = 0.727118229839169 (b = 2, short of 0.8);
    //          1 - pf(qf(0.95, 3, 2*3*2), 3, 12, ncp = 2*3*(30/10)^2/2) = 0.969326364840965 (b = 3).
    const result = within(screen.getByText('Blocks per site').closest('.fr-result-card') as HTMLElement);
    expect(await result.findByText('3')).toBeInTheDocument();
    expect(result.getByText(/Power 97% with 3 blocks at each of 2 sites: 24 plots in all, 6 error degrees of freedom per site/)).toBeInTheDocument();
    // EPPO PP 1/152 via DOMAIN.md: 4 treatments need 5 blocks for 12 error df.
    expect(screen.getByText(/With 4 treatments and 3 blocks each site has 6 error degrees of freedom; at least 12 .* 5 blocks give 12/)).toBeInTheDocument();
    expect(screen.getByText(/3 blocks is fewer than the 4 a site should have/)).toBeInTheDocument();
  });

  it('shows the fewer-than-4-blocks warning and keeps a number box’s problem beside it', async () => {
    powerServer();
    renderWithApp(<PlannerPage />);
    await fill({ Treatments: '3', CV: '5', Difference: '40', 'Target power': '0.8' });
    // R 4.2.2: 1 - pf(qf(0.95, 2, 2), 2, 2, ncp = 2*(40/5)^2/2) = 0.808198308493771, so 2 blocks already reach 0.8.
    expect(await screen.findByText(/2 blocks is fewer than the 4 a site should have/)).toBeInTheDocument();

    await setBox('CV', 'twelve');
    await userEvent.click(screen.getByRole('button', { name: 'Work out the blocks' }));
    expect(screen.getByText('CV must be a number, e.g. 12.5')).toBeInTheDocument();
  });

  it('shows the server’s sentence when no number of blocks reaches the target', async () => {
    powerServer({
      status: 422,
      body: { statusCode: 422, error: 'Unprocessable Entity', message: 'blocksForPower: 100 blocks give less than power 0.99; detect a larger difference or lower the CV' },
    });
    renderWithApp(<PlannerPage />);
    await fill({ CV: '60', Difference: '2', 'Target power': '0.99' });
    expect(await screen.findByRole('alert')).toHaveTextContent('100 blocks give less than power 0.99');
    expect(screen.getByText(/No recommendation for these numbers/)).toBeInTheDocument();
  });

  it('takes the CV from a saved analysis of one of the person’s trials, and says where it came from', async () => {
    const summary = { id: 5, trialId: 3, title: 'Drain time at the end', measureName: 'Drain time', roundLabel: 'Week 2', scopeLabel: 'all sites combined' };
    const bodies = powerServer(undefined, {
      '/api/trials/3/analyses': [summary],
      // An invented stored result: only its CV is read here.
      '/api/trials/3/analyses/5': { ...summary, choices: { transform: 'log' }, result: { summary: { cv: 23.456 } } },
    });
    const trials = [{ id: 3, code: 'CLAY-T', title: 'Clay test trial', design: 'rcbd' as const, status: 'locked' as const, myRoles: ['investigator' as const], updatedAt: '2026-11-20T09:00:00.000Z' }];
    renderWithApp(<PlannerPage trials={trials} />);
    await userEvent.selectOptions(screen.getByLabelText('Earlier trial'), 'CLAY-T — Clay test trial');
    await userEvent.selectOptions(await screen.findByLabelText('Saved analysis'), 'Drain time at the end · Drain time, Week 2');
    await vi.waitFor(() => expect(screen.getByLabelText('CV')).toHaveValue('23.5'));
    expect(screen.getByText('From Drain time at the end (Drain time, Week 2, all sites combined).')).toBeInTheDocument();
    expect(screen.getByText(/used a log transform, so its CV describes the transformed values/)).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Work out the blocks' }));
    await vi.waitFor(() => expect(bodies[0]).toMatchObject({ cv: 23.5, targetPower: 0.8 }));
  });
});
