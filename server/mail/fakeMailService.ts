import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

/** A message the fake mail service received, as the /dev/mailbox page shows it. */
export interface CapturedMail {
  id: number;
  to: string;
  subject: string;
  text: string;
  html: string;
  receivedAt: string;
}

export interface FakeMailService {
  port: number;
  messages: CapturedMail[];
  close(): Promise<void>;
}

/** Local SMTP server standing in for the hosted mail service in demo and test mode; keeps every message in memory. */
export async function startFakeMailService(port: number): Promise<FakeMailService> {
  const messages: CapturedMail[] = [];
  const server = new SMTPServer({
    secure: false,
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    disableReverseLookup: true,
    logger: false,
    onData(stream, _session, done) {
      simpleParser(stream)
        .then((mail) => {
          const to = [mail.to].flat().map((a) => a?.text ?? "").join(", ");
          messages.unshift({
            id: messages.length + 1,
            to,
            subject: mail.subject ?? "",
            text: mail.text ?? "",
            html: typeof mail.html === "string" ? mail.html : "",
            receivedAt: new Date().toISOString(),
          });
          done();
        })
        .catch(done);
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => resolve());
  });
  const address = server.server.address();
  return {
    port: typeof address === "object" && address ? address.port : port,
    messages,
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
