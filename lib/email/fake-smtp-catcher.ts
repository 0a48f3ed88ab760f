// Local stand-in for a mail relay: a real SMTP server on loopback (smtp-server) that parses
// what it receives (mailparser) and keeps it, with a small JSON API for the dev inbox and the tests.
import { createServer as createHttpServer, type Server as HttpServer } from "node:http";
import { randomUUID } from "node:crypto";
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";

export type CaughtMessage = { id: string; receivedAt: string; from: string; to: string[]; subject: string; text: string; html: string };

export type Catcher = { smtpPort: number; httpPort: number; messages: CaughtMessage[]; close(): Promise<void> };

export async function startCatcher({ smtpPort, httpPort, host = "127.0.0.1", keep = 500 }: { smtpPort: number; httpPort: number; host?: string; keep?: number }): Promise<Catcher> {
  const messages: CaughtMessage[] = [];
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    size: 10 * 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const to = session.envelope.rcptTo.map((r) => r.address);
          messages.unshift({
            id: randomUUID(),
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
  await new Promise<void>((resolve, reject) => {
    smtp.once("error", reject);
    smtp.listen(smtpPort, host, () => resolve());
  });

  const http: HttpServer = createHttpServer((req, res) => {
    const url = new URL(req.url ?? "/", `http://${host}`);
    const send = (status: number, body: unknown) => {
      res.writeHead(status, { "content-type": "application/json" });
      res.end(JSON.stringify(body));
    };
    if (req.method === "GET" && url.pathname === "/messages") {
      const to = url.searchParams.get("to")?.toLowerCase();
      return send(200, to ? messages.filter((m) => m.to.some((a) => a.toLowerCase() === to)) : messages);
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
  await new Promise<void>((resolve, reject) => {
    http.once("error", reject);
    http.listen(httpPort, host, () => resolve());
  });

  return {
    smtpPort,
    httpPort,
    messages,
    close: () =>
      Promise.all([new Promise<void>((r) => smtp.close(() => r())), new Promise<void>((r) => http.close(() => r()))]).then(() => undefined),
  };
}
