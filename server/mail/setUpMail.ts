import type { Config } from "@server/config";
import { startFakeMailService, type FakeMailService } from "@server/mail/fakeMailService";
import { createMailer, type Mailer } from "@server/mail/mailer";

/** With SMTP settings: mail goes there and no fake runs. Without: the local fake mail service catches it. */
export async function setUpMail(config: Config): Promise<{ mailer: Mailer; mailbox: FakeMailService | null }> {
  if (config.smtp) return { mailer: createMailer(config, 0), mailbox: null };
  const mailbox = await startFakeMailService(config.fakeMailPort).catch((e: Error) => {
    throw new Error(`Fake mail service could not listen on 127.0.0.1:${config.fakeMailPort}: ${e.message}`);
  });
  return { mailer: createMailer(config, mailbox.port), mailbox };
}
