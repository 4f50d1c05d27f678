import type { TrialSummary } from '@friable/contracts';
import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { AuthUser, TrialAccessContext } from '../auth/auth-user';
import type { CreateTrialDto } from './dto/create-trial.dto';
import type { UpdateTrialDto } from './dto/update-trial.dto';
import { Trial } from './models/trial.model';
import { TrialMembership, type TrialRole } from './models/trial-membership.model';


function summarise(trial: Trial, roles: TrialRole[]): TrialSummary {
  return {
    id: trial.id,
    code: trial.code,
    title: trial.title,
    design: trial.design,
    status: trial.status,
    myRoles: roles,
    updatedAt: trial.updatedAt.toISOString(),
  };
}

@Injectable()
export class TrialsService {
  constructor(
    @InjectModel(Trial) private readonly trials: typeof Trial,
    @InjectModel(TrialMembership) private readonly memberships: typeof TrialMembership,
    @InjectConnection() private readonly sequelize: Sequelize,
  ) {}

  /** The trials the person holds a role on; an instance administrator sees every trial. */
  async listFor(user: AuthUser): Promise<TrialSummary[]> {
    const mine = await this.memberships.findAll({ where: { userId: user.id } });
    const rolesByTrial = new Map<number, TrialRole[]>();
    for (const m of mine) rolesByTrial.set(m.trialId, [...new Set([...(rolesByTrial.get(m.trialId) ?? []), m.role])]);
    const trials = await this.trials.findAll({
      where: user.isAdmin ? {} : { id: [...rolesByTrial.keys()] },
      order: [['updatedAt', 'DESC'], ['id', 'DESC']],
    });
    return trials.map((t) => summarise(t, rolesByTrial.get(t.id) ?? []));
  }

  async create(input: CreateTrialDto, user: AuthUser): Promise<TrialSummary> {
    return this.sequelize.transaction(async (transaction) => {
      const trial = await this.trials.create(
        { code: input.code.toUpperCase(), title: input.title.trim(), design: input.design ?? 'rcbd', status: 'draft', createdBy: user.id },
        { transaction },
      );
      await this.memberships.create({ trialId: trial.id, userId: user.id, role: 'investigator', siteId: null }, { transaction });
      return summarise(trial, ['investigator']);
    });
  }

  async get(access: TrialAccessContext): Promise<TrialSummary> {
    const trial = await this.trials.findByPk(access.trialId);
    if (!trial) throw new NotFoundException('No such trial.');
    return summarise(trial, access.roles);
  }

  async update(access: TrialAccessContext, input: UpdateTrialDto): Promise<TrialSummary> {
    const trial = await this.trials.findByPk(access.trialId);
    if (!trial) throw new NotFoundException('No such trial.');
    if (input.title !== undefined) trial.title = input.title.trim();
    await trial.save();
    return summarise(trial, access.roles);
  }
}
