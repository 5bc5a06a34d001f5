import type { AddressInfo } from "node:net";
import { simpleParser, type AddressObject, type ParsedMail } from "mailparser";
import { SMTPServer } from "smtp-server";

export interface ReceivedMail {
  messageId: string | null;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
}

export interface EmbeddedSmtpServer {
  host: string;
  port: number;
  close(): Promise<void>;
}

const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

/**
 * A local SMTP server on 127.0.0.1 that hands every message it receives to `store` (which
 * writes it to the outbox). Plain SMTP only (STARTTLS disabled: it never leaves the machine),
 * no authentication. The SMTP reply is sent only after `store` finished, so a sender whose
 * `sendMail` resolved can read the message back at once.
 */
export async function startEmbeddedSmtpServer(options: {
  port: number;
  store: (mail: ReceivedMail) => Promise<void>;
}): Promise<EmbeddedSmtpServer> {
  const host = "127.0.0.1";
  const server = new SMTPServer({
    secure: false,
    disabledCommands: ["STARTTLS", "AUTH"],
    authOptional: true,
    logger: false,
    size: MAX_MESSAGE_BYTES,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => options.store(toReceivedMail(parsed, session.envelope.rcptTo.map((r) => r.address))))
        .then(
          () => callback(),
          (error: unknown) => callback(error instanceof Error ? error : new Error(String(error))),
        );
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(options.port, host, () => {
      server.off("error", reject);
      resolve();
    });
  });
  const { port } = server.server.address() as AddressInfo;
  return {
    host,
    port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = field === undefined ? [] : Array.isArray(field) ? field : [field];
  return list.flatMap((entry) => entry.value.map((a) => a.address ?? "")).filter(Boolean);
}

function toReceivedMail(parsed: ParsedMail, envelopeTo: string[]): ReceivedMail {
  const to = addresses(parsed.to);
  return {
    messageId: parsed.messageId ?? null,
    from: parsed.from?.text ?? "",
    to: to.length > 0 ? to : envelopeTo,
    subject: parsed.subject ?? "(no subject)",
    text: parsed.text ?? "",
    html: typeof parsed.html === "string" ? parsed.html : null,
  };
}
