// Local stand-in for a mail relay: a real SMTP server on loopback (smtp-server) that parses
// what it receives (mailparser) and keeps it, with a small JSON API for the dev inbox and the tests.
// A test can make it stall: it then holds its answer to the end of DATA (the moment a real relay
// may be slow to confirm) for a while before accepting.
import { createServer as createHttpServer, type Server as HttpServer } from "node:http";
import { randomUUID } from "node:crypto";
import type { AddressInfo } from "node:net";
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";

export type CaughtMessage = { id: string; messageId: string; receivedAt: string; from: string; to: string[]; subject: string; text: string; html: string };

export type Catcher = {
  smtpPort: number;
  httpPort: number;
  messages: CaughtMessage[];
  /** Hold the answer to each message's DATA for `ms` from now on (0: answer at once). */
  stall(ms: number): void;
  /** Messages received in full whose answer a stall is holding back. */
  held(): number;
  close(): Promise<void>;
};

export async function startCatcher({ smtpPort, httpPort, host = "127.0.0.1", keep = 500 }: { smtpPort: number; httpPort: number; host?: string; keep?: number }): Promise<Catcher> {
  const messages: CaughtMessage[] = [];
  let stallMs = 0;
  let held = 0;
  const hold = (ms: number) => (ms > 0 ? new Promise<void>((r) => setTimeout(r, ms)) : Promise.resolve());
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    size: 10 * 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          held++;
          await hold(stallMs).finally(() => held--);
          const to = session.envelope.rcptTo.map((r) => r.address);
          messages.unshift({
            id: randomUUID(),
            messageId: parsed.messageId ?? "",
            receivedAt: new Date().toISOString(),
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
            to,
            subject: parsed.subject ?? "",
            text: parsed.text ?? "",
            html: typeof parsed.html === "string" ? parsed.html : "",
          });
          messages.length = Math.min(messages.length, keep);
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  // Port 0 picks a free port (a test's private catcher); the bound ports are returned.
  const boundSmtpPort = await new Promise<number>((resolve, reject) => {
    smtp.once("error", reject);
    const server = smtp.listen(smtpPort, host, () => resolve((server.address() as AddressInfo).port));
  });

  const http: HttpServer = createHttpServer((req, res) => {
    const url = new URL(req.url ?? "/", `http://${host}`);
    const send = (status: number, body: unknown) => {
      res.writeHead(status, { "content-type": "application/json" });
      res.end(JSON.stringify(body));
    };
    if (req.method === "GET" && url.pathname === "/messages") {
      const to = url.searchParams.get("to")?.toLowerCase();
      const messageId = url.searchParams.get("messageId");
      return send(
        200,
        messages.filter((m) => (!to || m.to.some((a) => a.toLowerCase() === to)) && (!messageId || m.messageId === messageId)),
      );
    }
    const one = url.pathname.match(/^\/messages\/([\w-]+)$/);
    if (req.method === "GET" && one) {
      const m = messages.find((x) => x.id === one[1]);
      return m ? send(200, m) : send(404, { error: "not_found" });
    }
    if (req.method === "DELETE" && url.pathname === "/messages") {
      messages.length = 0;
      return send(200, { ok: true });
    }
    if (req.method === "GET" && url.pathname === "/health") return send(200, { ok: true });
    send(404, { error: "not_found" });
  });
  const boundHttpPort = await new Promise<number>((resolve, reject) => {
    http.once("error", reject);
    http.listen(httpPort, host, () => resolve((http.address() as AddressInfo).port));
  });

  return {
    smtpPort: boundSmtpPort,
    httpPort: boundHttpPort,
    messages,
    stall: (ms) => {
      stallMs = Math.max(0, ms);
    },
    held: () => held,
    close: () =>
      Promise.all([new Promise<void>((r) => smtp.close(() => r())), new Promise<void>((r) => http.close(() => r()))]).then(() => undefined),
  };
}
