import type { Sequelize, Transaction } from 'sequelize';
import { replaceAccessStamp } from './data-stamps.service';

interface HookOptions {
  transaction?: Transaction | null;
  /** The columns an update wrote (attribute names), when Sequelize says. */
  fields?: string[];
}

/**
 * A model hook that replaces the access stamp (ACCESS_SCOPE) after each change of the model's rows, or only
 * after changes that write one of `fields`, so the sessions and memberships every API instance keeps in memory
 * are read again on the next request. Works for single and bulk hooks: Sequelize passes the options last, and
 * runs the hook with the model as `this`. Written as a hook, not in each service, so a change made anywhere
 * (a service, the demo loader, a test, a script on the models) cannot forget it.
 * Example: `@AfterBulkUpdate static readonly accessChanged = accessStampHook(['isActive'])`.
 */
export function accessStampHook(fields?: readonly string[]) {
  return function accessChanged(this: { sequelize?: Sequelize }, ...args: unknown[]): Promise<void> | undefined {
    const options = (args[args.length - 1] ?? {}) as HookOptions;
    if (fields && options.fields && !options.fields.some((field) => fields.includes(field))) return undefined;
    if (!this.sequelize) return undefined;
    return replaceAccessStamp(this.sequelize, options.transaction);
  };
}
