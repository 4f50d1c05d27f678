import type { OutboxMessage } from '@friable/contracts';
import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { appConfig } from '../config/app.config';
import { mailConfig } from '../config/mail.config';

const OUTBOX_LIMIT = 200;

function isOutboxMessage(value: unknown): value is OutboxMessage {
  const m = value as Partial<OutboxMessage> | null;
  return !!m && typeof m.id === 'string' && typeof m.receivedAt === 'string' && typeof m.subject === 'string' && Array.isArray(m.to);
}

/** The development Outbox: the messages the local SMTP sink caught, read from MAIL_OUTBOX_DIR. */
@Injectable()
export class OutboxService {
  constructor(
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
    @Inject(mailConfig.KEY) private readonly mail: ConfigType<typeof mailConfig>,
  ) {}

  /** The newest messages first (at most 200); 404 in production, where no sink runs. */
  async list(): Promise<OutboxMessage[]> {
    if (this.app.nodeEnv === 'production') throw new NotFoundException('The Outbox exists only in development.');
    let names: string[];
    try {
      names = (await readdir(this.mail.outboxDir)).filter((name) => name.endsWith('.json'));
    } catch {
      return []; // the sink has caught nothing yet
    }
    const messages: OutboxMessage[] = [];
    for (const name of names) {
      try {
        const parsed: unknown = JSON.parse(await readFile(join(this.mail.outboxDir, name), 'utf8'));
        if (isOutboxMessage(parsed)) messages.push({ ...parsed, from: parsed.from ?? '', text: parsed.text ?? '', html: parsed.html ?? null });
      } catch {
        // a file still being written, or not the sink's: skip it
      }
    }
    return messages.sort((a, b) => b.receivedAt.localeCompare(a.receivedAt) || b.id.localeCompare(a.id)).slice(0, OUTBOX_LIMIT);
  }
}
