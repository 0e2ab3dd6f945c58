// The local SMTP fake started beside the app by `npm run up` and the browser tests'
// app server (scripts/services.ts): listens on 127.0.0.1:$SMTP_PORT and stores every
// message in the dev_mail table of $DATABASE_URL, where /dev/mailbox shows it.
// Run with: node --conditions=react-server --import tsx scripts/mail-catcher.ts
import { closeDb } from '../db/client';
import { insertDevMail } from '../db/queries/dev-mail';
import { startMailCatcher } from '../lib/mail/catcher';

const port = Number(process.env.SMTP_PORT ?? 2525);
const catcher = await startMailCatcher({
  port,
  store: async (mail) => {
    await insertDevMail(mail);
    console.log(`[mail] captured "${mail.subject}" for ${mail.toAddresses}`);
  },
});
console.log(`[mail] SMTP fake listening on 127.0.0.1:${catcher.port}`);

async function stop() {
  await catcher.close();
  await closeDb();
  process.exit(0);
}
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
