import type { OutboxMessage } from '@friable/contracts';
import { readdirSync, readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
// The repository root as the devstack scripts know it.
import { repoRoot } from '../../../devstack/src/env.mjs';

/** The folder the SMTP sink writes to: npm test's own sink, or the one named by MAIL_OUTBOX_DIR. */
export const outboxDir = () => process.env.FRIABLE_TEST_OUTBOX ?? resolve(repoRoot, process.env.MAIL_OUTBOX_DIR ?? '.data/outbox');

/** Every caught message to this address, oldest first. */
export function messagesTo(email: string): OutboxMessage[] {
  let names: string[] = [];
  try {
    names = readdirSync(outboxDir()).filter((n) => n.endsWith('.json'));
  } catch {
    return [];
  }
  return names
    .map((n) => JSON.parse(readFileSync(resolve(outboxDir(), n), 'utf8')) as OutboxMessage)
    .filter((m) => m.to.includes(email))
    .sort((a, b) => a.receivedAt.localeCompare(b.receivedAt) || a.id.localeCompare(b.id));
}

/** Waits (up to 5 s) until `count` messages to the address have been caught, and returns them. */
export async function waitForMessages(email: string, count = 1): Promise<OutboxMessage[]> {
  for (let attempt = 0; attempt < 50; attempt += 1) {
    const found = messagesTo(email);
    if (found.length >= count) return found;
    await sleep(100);
  }
  throw new Error(`expected ${count} e-mail(s) to ${email} in ${outboxDir()}, found ${messagesTo(email).length}`);
}

/** The token in the invitation link of a caught message. */
export function linkToken(message: OutboxMessage): string {
  const match = /\/invitations\/([A-Za-z0-9_-]+)/.exec(message.text);
  if (!match) throw new Error(`no invitation link in: ${message.text}`);
  return match[1];
}

let siteCounter = 0;

/** A site written straight to the sites table (the protocol feature's own API is tested elsewhere). */
export async function createSite(sequelize: Sequelize, trialId: number, name: string): Promise<number> {
  siteCounter += 1;
  const prefix = `${String.fromCharCode(65 + (siteCounter % 26))}${String.fromCharCode(65 + Math.floor(siteCounter / 26) % 26)}`;
  const [id] = await sequelize.query(
    `INSERT INTO sites (trial_id, name, shape, length_m, width_m, blocks, label_prefix, created_at, updated_at)
     VALUES (?, ?, 'rectangle', 1.2, 1.0, 4, ?, NOW(), NOW())`,
    { replacements: [trialId, name, prefix], type: QueryTypes.INSERT },
  );
  return Number(id);
}

export const uniqueCode = (stem = 'TM') => `${stem}-${Math.random().toString(36).slice(2, 10).toUpperCase()}`;
export const uniqueEmail = (stem: string) => `${stem}-${Math.random().toString(36).slice(2, 10)}@example.org`;
