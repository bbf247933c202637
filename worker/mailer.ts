import nodemailer from 'nodemailer';

export interface OutgoingMail { to: string; subject: string; text: string; html: string; messageId?: string; headers?: Record<string, string> }
export interface Mailer { send(mail: OutgoingMail): Promise<void>; close(): void }

export function createMailer(smtpUrl: string, from: string): Mailer {
  const transport = nodemailer.createTransport(smtpUrl);
  return {
    async send(mail) {
      await transport.sendMail({ from, ...mail });
    },
    close: () => transport.close(),
  };
}
