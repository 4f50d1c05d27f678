import bcrypt from 'bcryptjs';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Sequelize } from 'sequelize-typescript';
import { Trial, type TrialDesign, type TrialStatus } from '../trials/models/trial.model';
import { TrialMembership, type TrialRole } from '../trials/models/trial-membership.model';
import { User } from '../users/models/user.model';

interface DemoScenario {
  people: Array<{ email: string; name: string; isAdmin: boolean; describe: string }>;
  trials: Array<{ code: string; title: string; design: TrialDesign; status: TrialStatus; members: Array<{ email: string; role: TrialRole }> }>;
}

export const demoScenarioFile = resolve(__dirname, '../../../../datasets/demo/people.json');

export function readDemoScenario(): DemoScenario {
  return JSON.parse(readFileSync(demoScenarioFile, 'utf8')) as DemoScenario;
}

/**
 * Loads the invented demo people and trials once: people and trials that already exist are left as
 * they are, so running it again changes nothing. The protocols come next, from DemoLoaderService.
 */
export async function loadDemoScenario(sequelize: Sequelize, password: string): Promise<{ created: number }> {
  const scenario = readDemoScenario();
  let created = 0;
  await sequelize.transaction(async (transaction) => {
    const passwordHash = await bcrypt.hash(password, 10);
    const ids = new Map<string, number>();
    for (const person of scenario.people) {
      const [user, isNew] = await User.findOrCreate({
        where: { email: person.email },
        defaults: { email: person.email, name: person.name, passwordHash, isAdmin: person.isAdmin, isActive: true },
        transaction,
      });
      ids.set(person.email, user.id);
      if (isNew) created += 1;
    }
    for (const plan of scenario.trials) {
      const [trial, isNew] = await Trial.findOrCreate({
        where: { code: plan.code },
        // New trials start as drafts: the protocol loader activates them through the same checks as the API.
        defaults: { code: plan.code, title: plan.title, design: plan.design, status: 'draft', seed: 'friable', createdBy: ids.get(plan.members[0].email) },
        transaction,
      });
      if (!isNew) continue;
      created += 1;
      for (const member of plan.members) {
        await TrialMembership.create({ trialId: trial.id, userId: ids.get(member.email), role: member.role, siteId: null }, { transaction });
      }
    }
  });
  return { created };
}
