// Sends one e-mail over SMTP with nodemailer. A real server is configuration only (SMTP_URL); the local
// mail catcher is plain SMTP on loopback, the only place where TLS is left out.
import nodemailer from 'nodemailer';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<{ messageId: string }>;
  close(): void;
}

export type MailServer =
  /** SMTP_URL: smtp:// (STARTTLS, required unless the host is loopback) or smtps:// (TLS from the start) */
  | { kind: 'smtp'; url: string }
  /** the dev/test mail catcher on 127.0.0.1 */
  | { kind: 'catcher'; port: number };

// a stuck server must not hold the worker's tick for long; the row is retried later
const timeouts = { connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 30_000 };

function isLoopback(hostname: string): boolean {
  return hostname === 'localhost' || hostname === '[::1]' || /^127\./.test(hostname);
}

function transportFor(server: MailServer) {
  if (server.kind === 'catcher') {
    return nodemailer.createTransport({
      host: '127.0.0.1',
      port: server.port,
      secure: false,
      ignoreTLS: true,
      ...timeouts,
    });
  }
  const url = new URL(server.url);
  const implicitTls = url.protocol === 'smtps:';
  // a relay on the same machine may offer no TLS; anything else must upgrade before credentials go out
  return nodemailer.createTransport({
    url: server.url,
    requireTLS: !implicitTls && !isLoopback(url.hostname),
    ...timeouts,
  });
}

export function createMailer(server: MailServer, from: string): Mailer {
  const transport = transportFor(server);
  return {
    async send(mail) {
      const info = await transport.sendMail({
        from,
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        html: mail.html,
      });
      return { messageId: info.messageId };
    },
    close: () => transport.close(),
  };
}

/** Used when MAIL_FROM is not set (development and tests); RFC 2606 keeps .invalid from ever resolving. */
export const defaultMailFrom = 'Railyard <notifications@railyard.invalid>';
