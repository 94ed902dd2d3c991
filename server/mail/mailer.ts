import nodemailer from "nodemailer";
import type { Config } from "@server/config";

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

export type Mailer = { send(mail: OutgoingMail): Promise<void> };

/** SMTP transport: the configured server, else the local fake mail service on `fallbackPort`. */
export function createMailer(config: Config, fallbackPort: number): Mailer {
  const transport = config.smtp
    ? nodemailer.createTransport({
        host: config.smtp.host,
        port: config.smtp.port,
        secure: config.smtp.secure,
        auth: config.smtp.user ? { user: config.smtp.user, pass: config.smtp.password } : undefined,
      })
    : nodemailer.createTransport({ host: "127.0.0.1", port: fallbackPort, secure: false, ignoreTLS: true });
  return {
    async send(mail) {
      await transport.sendMail({ from: config.mailFrom, ...mail });
    },
  };
}
