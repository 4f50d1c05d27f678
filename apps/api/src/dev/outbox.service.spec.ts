import { NotFoundException } from '@nestjs/common';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readAppConfig } from '../config/app.config';
import { readMailConfig } from '../config/mail.config';
import { OutboxService } from './outbox.service';

function outboxWith(nodeEnv: string, files: Record<string, string>) {
  const dir = mkdtempSync(join(tmpdir(), 'friable-outbox-'));
  for (const [name, text] of Object.entries(files)) writeFileSync(join(dir, name), text);
  const env = { NODE_ENV: nodeEnv, MAIL_OUTBOX_DIR: dir };
  return new OutboxService(readAppConfig(env), readMailConfig(env));
}

const message = (id: string, receivedAt: string) => JSON.stringify({ id, receivedAt, from: 'Friable <no-reply@example.org>', to: ['a@example.org'], subject: id, text: 'hi', html: null });

describe('OutboxService', () => {
  it('lists the caught messages newest first and skips files that are not messages', async () => {
    const outbox = outboxWith('development', {
      'a.json': message('older', '2026-12-01T10:00:00.000Z'),
      'b.json': message('newer', '2026-12-02T10:00:00.000Z'),
      'c.json': '{ not json',
      'd.txt': 'ignored',
    });
    expect((await outbox.list()).map((m) => m.id)).toEqual(['newer', 'older']);
  });

  it('answers an empty list before the sink has written anything', async () => {
    const env = { NODE_ENV: 'development', MAIL_OUTBOX_DIR: join(tmpdir(), 'friable-outbox-missing-folder') };
    expect(await new OutboxService(readAppConfig(env), readMailConfig(env)).list()).toEqual([]);
  });

  it('does not exist in production', async () => {
    await expect(outboxWith('production', { 'a.json': message('x', '2026-12-01T10:00:00.000Z') }).list()).rejects.toBeInstanceOf(NotFoundException);
  });
});
