import { describe, expect, it, vi } from 'vitest';
import { ObservationsExistException } from '../common/exceptions/observations-exist.exception';
import { TrialLockedException } from '../common/exceptions/trial-locked.exception';
import { ProtocolGateService } from './protocol-gate.service';

type Fake = Record<string, ReturnType<typeof vi.fn>>;

function gateWith(options: { status?: string; observed?: number[] }) {
  const sites = [
    { id: 1, name: 'Hollow Lane', randomizedAt: new Date(), randomizationSeed: 's', save: vi.fn() },
    { id: 2, name: 'Millbrook', randomizedAt: new Date(), randomizationSeed: 's', save: vi.fn() },
  ];
  const trials: Fake = { findByPk: vi.fn(async () => ({ id: 7, status: options.status ?? 'active' })) };
  const siteModel: Fake = { findAll: vi.fn(async ({ where }: { where: { id?: number[] } }) => sites.filter((s) => !where.id || where.id.includes(s.id))) };
  const plots: Fake = { destroy: vi.fn(async () => 12) };
  const observations = { sitesWithObservations: vi.fn(async (_trialId: number, ids?: number[]) => (options.observed ?? []).filter((id) => !ids || ids.includes(id))) };
  const activity = { record: vi.fn(async () => undefined) };
  const gate = new ProtocolGateService(trials as never, siteModel as never, plots as never, observations as never, activity as never, {} as never);
  return { gate, plots, activity, sites };
}

const transaction = { LOCK: { UPDATE: 'UPDATE' } } as never;

describe('ProtocolGateService with a stubbed observations guard', () => {
  it('refuses writes to a locked or archived trial', async () => {
    await expect(gateWith({ status: 'locked' }).gate.openForWrite(7, transaction)).rejects.toThrow(new TrialLockedException('locked'));
    await expect(gateWith({ status: 'archived' }).gate.openForWrite(7, transaction)).rejects.toThrow('This trial is archived; an archived trial can no longer be changed.');
    await expect(gateWith({ status: 'active' }).gate.openForWrite(7, transaction)).resolves.toMatchObject({ id: 7 });
  });

  it('clears the layouts of sites without observations and records each', async () => {
    const { gate, plots, activity, sites } = gateWith({ observed: [] });
    expect(await gate.clearLayouts(7, 'all', { userId: 3, what: 'Adding treatment X' }, transaction)).toEqual(['Hollow Lane', 'Millbrook']);
    expect(plots.destroy).toHaveBeenCalledTimes(2);
    expect(sites.every((s) => s.randomizedAt === null && s.randomizationSeed === null)).toBe(true);
    expect(activity.record).toHaveBeenCalledWith(transaction, expect.objectContaining({ kind: 'site.layout-cleared', siteId: 1, details: { plotsRemoved: 12, reason: 'Adding treatment X' } }));
  });

  it('refuses the whole edit when an affected site holds observations, clearing nothing', async () => {
    const { gate, plots, activity } = gateWith({ observed: [2] });
    await expect(gate.clearLayouts(7, 'all', { userId: 3, what: 'Deleting treatment G' }, transaction)).rejects.toThrow(
      new ObservationsExistException('Deleting treatment G', ['Millbrook']),
    );
    expect(plots.destroy).not.toHaveBeenCalled();
    expect(activity.record).not.toHaveBeenCalled();
    // Only the sites the edit touches count: changing Hollow Lane's blocks is fine.
    await expect(gate.clearLayouts(7, [1], { userId: 3, what: 'Changing the blocks' }, transaction)).resolves.toEqual(['Hollow Lane']);
  });
});
