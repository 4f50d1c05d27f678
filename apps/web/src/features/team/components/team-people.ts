import type { Member, TrialRole } from '@friable/contracts';

/** One person on the team, with every role and site they hold. */
export interface TeamPerson {
  userId: number;
  name: string;
  email: string;
  roles: TrialRole[];
  siteIds: number[];
  siteNames: string[];
  since: string;
}

/** Members (one row per role and site) as people, in the order the API gives them. */
export function teamPeople(members: Member[]): TeamPerson[] {
  const people = new Map<number, TeamPerson>();
  for (const m of members) {
    const person = people.get(m.userId) ?? { userId: m.userId, name: m.name, email: m.email, roles: [], siteIds: [], siteNames: [], since: m.since };
    if (!person.roles.includes(m.role)) person.roles.push(m.role);
    if (m.siteId !== null) person.siteIds.push(m.siteId);
    if (m.siteName) person.siteNames.push(m.siteName);
    if (m.since < person.since) person.since = m.since;
    people.set(m.userId, person);
  }
  return [...people.values()];
}
