/** Outgoing e-mail through nodemailer (SMTP catcher locally, a real relay in production). */
import nodemailer, { type Transporter } from 'nodemailer';
import { config } from '../config';

export interface Message {
  to: string[];
  subject: string;
  text: string;
  html: string;
}

let transport: Transporter | undefined;

function transporter(): Transporter {
  const m = config().mail;
  transport ??= nodemailer.createTransport({ host: m.host, port: m.port, secure: m.secure, auth: m.auth, ignoreTLS: !m.secure && !m.auth });
  return transport;
}

/** Sends one message; failures are logged and reported, never thrown into the caller's transaction. */
export async function send(message: Message): Promise<boolean> {
  if (message.to.length === 0) return true;
  try {
    await transporter().sendMail({
      from: config().mail.from,
      to: message.to.join(', '),
      subject: message.subject,
      text: message.text,
      html: message.html
    });
    return true;
  } catch (err) {
    console.error('[phosforge] mail not sent:', message.subject, '→', message.to.join(', '), (err as Error).message);
    return false;
  }
}
