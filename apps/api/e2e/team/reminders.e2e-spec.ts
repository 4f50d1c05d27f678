import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { RoundReminder } from '../../src/reminders/models/round-reminder.model';
import { calendarDate } from '../../src/reminders/calendar-date';
import { RemindersService } from '../../src/reminders/reminders.service';
import { Trial } from '../../src/trials/models/trial.model';
import { TrialMembership } from '../../src/trials/models/trial-membership.model';
import { bearer, createPerson, createTestApp, tokenFor, type TestApp } from '../support/test-app';
import { createSite, messagesTo, uniqueCode } from './team-support';

describe('round reminders', () => {
  let t: TestApp;
  let trialId: number;
  let dueRound: number;
  const people: Record<string, { id: number; email: string }> = {};
  // 07:00 local time today: the job's usual hour, so "tomorrow" is unambiguous.
  const now = new Date(new Date().setHours(7, 0, 0, 0));

  async function addRound(label: string, dayOffset: number): Promise<number> {
    const [id] = await t.sequelize.query('INSERT INTO assessment_rounds (trial_id, label, day_offset, created_at, updated_at) VALUES (?, ?, ?, NOW(), NOW())', {
      replacements: [trialId, label, dayOffset],
      type: QueryTypes.INSERT,
    });
    return Number(id);
  }

  beforeAll(async () => {
    t = await createTestApp();
    const lead = await createPerson({ name: 'Lead' });
    const created = await t.http.post('/api/trials').set(bearer(await tokenFor(t, lead))).send({ code: uniqueCode('RM'), title: 'Reminder trial' });
    trialId = created.body.id;
    const millbrook = await createSite(t.sequelize, trialId, 'Millbrook');
    const hollow = await createSite(t.sequelize, trialId, 'Hollow Lane');
    await createSite(t.sequelize, trialId, 'Unstaffed'); // a site without a collaborator gets no e-mail
    for (const [key, siteId] of [['millbrookA', millbrook], ['millbrookB', millbrook], ['hollow', hollow]] as const) {
      const person = await createPerson({ name: `Collaborator ${key}` });
      people[key] = person;
      await TrialMembership.create({ trialId, userId: person.id, role: 'collaborator', siteId });
    }
    const reviewer = await createPerson({ name: 'Reviewer' });
    people.reviewer = reviewer;
    await TrialMembership.create({ trialId, userId: reviewer.id, role: 'reviewer', siteId: null });
    // Week 2 is due tomorrow; week 4 later. The trial started 13 days ago.
    await Trial.update({ status: 'active' }, { where: { id: trialId } });
    await t.sequelize.query('UPDATE trials SET start_date = ? WHERE id = ?', { replacements: [calendarDate(now, 1 - 14), trialId], type: QueryTypes.UPDATE });
    dueRound = await addRound('Week 2', 14);
    await addRound('Week 4', 28);
  });
  afterAll(() => t.close());

  it('e-mails each collaborator once for a round due tomorrow at their site, and never twice', async () => {
    const reminders = t.app.get(RemindersService);
    const first = await reminders.sendDueReminders(now);
    expect(first.dueDate).toBe(calendarDate(now, 1));
    expect(first.sent).toBeGreaterThanOrEqual(3); // other trials in the database may have rounds due too

    for (const key of ['millbrookA', 'millbrookB', 'hollow']) {
      const mails = messagesTo(people[key].email);
      expect(mails).toHaveLength(1);
      expect(mails[0].subject).toBe(`Tomorrow: Week 2 at ${key === 'hollow' ? 'Hollow Lane' : 'Millbrook'} (${(await Trial.findByPk(trialId))!.code})`);
      expect(mails[0].text).toMatch(/plot-plan\?site=\d+/);
      expect(mails[0].text).toMatch(/gloves/);
    }
    expect(messagesTo(people.reviewer.email)).toEqual([]);
    const rows = await RoundReminder.findAll({ where: { roundId: dueRound }, raw: true });
    expect(rows.map((r) => r.userId).sort()).toEqual([people.millbrookA.id, people.millbrookB.id, people.hollow.id].sort());
    expect(rows.every((r) => r.dueDate === calendarDate(now, 1))).toBe(true);

    const second = await reminders.sendDueReminders(now);
    expect(second.sent).toBe(0);
    for (const key of ['millbrookA', 'millbrookB', 'hollow']) expect(messagesTo(people[key].email)).toHaveLength(1);
    expect(await RoundReminder.count({ where: { roundId: dueRound } })).toBe(3);
  });

  it('sends nothing for a trial that is not active', async () => {
    await Trial.update({ status: 'draft' }, { where: { id: trialId } });
    const before = messagesTo(people.hollow.email).length;
    const dayBeforeWeek4 = new Date(now.getFullYear(), now.getMonth(), now.getDate() + 14, 7);
    await t.app.get(RemindersService).sendDueReminders(dayBeforeWeek4);
    expect(messagesTo(people.hollow.email)).toHaveLength(before);
    await Trial.update({ status: 'active' }, { where: { id: trialId } });
  });

  it('honours each collaborator’s settings: none with reminders off, the due date in their own locale', async () => {
    const [quiet, german] = [people.millbrookA, people.millbrookB];
    expect((await t.http.patch('/api/users/me').set(bearer(await tokenFor(t, quiet))).send({ emailReminders: false })).body.emailReminders).toBe(false);
    expect((await t.http.patch('/api/users/me').set(bearer(await tokenFor(t, german))).send({ locale: 'de-DE' })).body.locale).toBe('de-DE');
    const counts = { quiet: messagesTo(quiet.email).length, german: messagesTo(german.email).length, hollow: messagesTo(people.hollow.email).length };
    const dayBeforeWeek4 = new Date(now.getFullYear(), now.getMonth(), now.getDate() + 14, 7);
    const run = await t.app.get(RemindersService).sendDueReminders(dayBeforeWeek4);
    const [year, month, day] = run.dueDate.split('-').map(Number);
    expect(messagesTo(quiet.email)).toHaveLength(counts.quiet);
    const [toGerman] = messagesTo(german.email).slice(counts.german);
    const [toHollow] = messagesTo(people.hollow.email).slice(counts.hollow);
    // CLDR month names: German for the de-DE account, English (day month year) for an account without a locale.
    const deMonths = ['Januar', 'Februar', 'März', 'April', 'Mai', 'Juni', 'Juli', 'August', 'September', 'Oktober', 'November', 'Dezember'];
    const enMonths = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];
    expect(toGerman.subject).toMatch(/^Tomorrow: Week 4 at Millbrook/);
    expect(toGerman.text).toContain(`is due tomorrow, ${['Sonntag', 'Montag', 'Dienstag', 'Mittwoch', 'Donnerstag', 'Freitag', 'Samstag'][new Date(Date.UTC(year, month - 1, day)).getUTCDay()]}, ${day}. ${deMonths[month - 1]} ${year}, at Millbrook.`);
    expect(toHollow.text).toContain(`, ${day} ${enMonths[month - 1]} ${year}, at Hollow Lane.`);
    const quietRows = await RoundReminder.count({ where: { userId: quiet.id, dueDate: run.dueDate } });
    expect(quietRows).toBe(0);
  });
});
