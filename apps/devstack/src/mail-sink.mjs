// A local SMTP sink in place of a hosted mail service: it accepts every message on loopback and
// writes it as JSON to the outbox folder, which the API's development-only Outbox page reads.
import { mkdirSync, renameSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { repoRoot } from './env.mjs';
import { log } from './run.mjs';

export async function startMailSink(env) {
  const { SMTPServer } = await import('smtp-server');
  const { simpleParser } = await import('mailparser');
  const outbox = resolve(repoRoot, env.MAIL_OUTBOX_DIR || '.data/outbox');
  mkdirSync(outbox, { recursive: true });
  let sequence = 0;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((mail) => {
          sequence += 1;
          const receivedAt = new Date();
          const id = `${receivedAt.getTime()}-${process.pid}-${sequence}`;
          const message = {
            id,
            receivedAt: receivedAt.toISOString(),
            from: mail.from?.text ?? '',
            to: session.envelope.rcptTo.map((rcpt) => rcpt.address),
            subject: mail.subject ?? '',
            text: mail.text ?? '',
            html: typeof mail.html === 'string' ? mail.html : null,
          };
          // Written under another name, then renamed: a reader of *.json never sees half a message.
          const path = join(outbox, `${id}.json`);
          writeFileSync(`${path}.part`, JSON.stringify(message, null, 2));
          renameSync(`${path}.part`, path);
          callback();
        })
        .catch(callback);
    },
  });
  const port = Number(env.SMTP_PORT);
  await new Promise((resolvePromise, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', resolvePromise);
  });
  log(`SMTP sink listening on 127.0.0.1:${port}, writing to ${outbox}`);
  return { outbox, close: () => server.close() };
}
