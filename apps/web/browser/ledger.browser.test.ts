import type { Observation, TrialDetail, TrialSummary } from '@friable/contracts';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { api, baseUrl, launchBrowser, screenshot, signIn } from './support';

/** Double-clicks a grid cell (row, column of the main part), types a value and saves it with Enter. */
async function typeInCell(page: Page, row: number, col: number, text: string) {
  const cell = page.locator(`.bp6-table-quadrant-main .bp6-table-cell-row-${row}.bp6-table-cell-col-${col}`);
  await cell.dblclick();
  const input = cell.locator('input, textarea').first();
  await input.fill(text);
  await input.press('Enter');
}

describe('two people edit the same Ledger cell', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser.close());

  it('the second save meets a conflict, sees the stored value and keeps their own only on purpose', async () => {
    const collaborator = await (await browser.newContext({ viewport: { width: 1280, height: 800 } })).newPage();
    const investigator = await (await browser.newContext({ viewport: { width: 1280, height: 800 } })).newPage();
    await signIn(collaborator, 'hollow.lane@example.org');
    await signIn(investigator, 'investigator@example.org');
    await collaborator.getByRole('heading', { name: 'Trials', exact: true }).waitFor();
    await investigator.getByRole('heading', { name: 'Trials', exact: true }).waitFor();

    const trialId = (await api<TrialSummary[]>(collaborator, '/trials')).find((t) => t.code === 'FW-CLAY-26')!.id;
    const trial = await api<TrialDetail>(collaborator, `/trials/${trialId}`);
    const site = trial.sites.find((s) => s.name === 'Hollow Lane Community Garden')!;
    const round = trial.rounds.find((r) => r.label === 'Day 14')!;
    const drain = trial.measures.find((m) => m.code === 'DRAIN')!;
    const plots = await api<Array<{ id: number; label: string; block: number; position: number }>>(collaborator, `/trials/${trialId}/plots?siteId=${site.id}`);
    const first = [...plots].sort((a, b) => a.block - b.block || a.position - b.position)[0]!;
    const existing = (await api<Observation[]>(collaborator, `/trials/${trialId}/observations?siteId=${site.id}&roundId=${round.id}`)).find(
      (o) => o.plotId === first.id && o.measureId === drain.id,
    );
    if (!existing) await api(collaborator, `/trials/${trialId}/observations`, { method: 'POST', json: { plotId: first.id, roundId: round.id, measureId: drain.id, value: '300' } });

    const address = `${baseUrl()}/trials/${trialId}/ledger?site=${site.id}&round=${round.id}`;
    await collaborator.goto(address);
    await investigator.goto(address);
    await collaborator.getByText(/values recorded/).waitFor();
    await investigator.getByText(/values recorded/).waitFor();

    const stamp = Date.now() % 400;
    const theirs = String(100 + stamp);
    const mine = String(101 + stamp);
    const drainColumn = 3 + [...trial.measures].filter((m) => round.measureIds.includes(m.id)).sort((a, b) => a.position - b.position).findIndex((m) => m.id === drain.id);
    await typeInCell(collaborator, 0, drainColumn, theirs);
    await collaborator.locator(`.bp6-table-quadrant-main .bp6-table-cell-row-0.bp6-table-cell-col-${drainColumn}`).getByText(theirs, { exact: true }).waitFor();
    await expect.poll(async () => (await api<Observation[]>(collaborator, `/trials/${trialId}/observations?siteId=${site.id}&roundId=${round.id}`)).find((o) => o.plotId === first.id && o.measureId === drain.id)?.valueText).toBe(theirs);

    // The investigator's page still holds the older version.
    await typeInCell(investigator, 0, drainColumn, mine);
    const dialog = investigator.getByRole('dialog', { name: 'Someone else changed this value' });
    await dialog.waitFor();
    expect(await dialog.innerText()).toContain(theirs);
    expect(await dialog.innerText()).toContain(mine);
    await screenshot(investigator, 'ledger-conflict');
    await dialog.getByRole('button', { name: 'Keep mine' }).click();
    await expect.poll(async () => (await api<Observation[]>(investigator, `/trials/${trialId}/observations?siteId=${site.id}&roundId=${round.id}`)).find((o) => o.plotId === first.id && o.measureId === drain.id)?.valueText).toBe(mine);

    await collaborator.reload();
    await collaborator.locator(`.bp6-table-quadrant-main .bp6-table-cell-row-0.bp6-table-cell-col-${drainColumn}`).getByText(mine, { exact: true }).waitFor();
  });
});
