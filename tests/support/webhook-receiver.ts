// A stand-in for the app's webhook endpoint in the payment stand-in's tests: a loopback HTTP
// server that keeps every request (raw body, Stripe-Signature, arrival time) and answers each
// with the next status of a queue (200 once the queue is empty).
import { createServer } from "node:http";
import type { AddressInfo } from "node:net";

export type ReceivedHook = { at: number; body: string; signature: string | null; status: number; type: string; eventId: string };

export async function startReceiver() {
  const hits: ReceivedHook[] = [];
  const answers: number[] = [];
  const server = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => chunks.push(c));
    req.on("end", () => {
      const body = Buffer.concat(chunks).toString("utf8");
      const status = answers.shift() ?? 200;
      const parsed = JSON.parse(body) as { id: string; type: string };
      hits.push({ at: Date.now(), body, signature: (req.headers["stripe-signature"] as string | undefined) ?? null, status, type: parsed.type, eventId: parsed.id });
      res.writeHead(status, { "content-type": "application/json" });
      res.end(JSON.stringify({ received: status < 300 }));
    });
  });
  const port = await new Promise<number>((resolve) => server.listen(0, "127.0.0.1", () => resolve((server.address() as AddressInfo).port)));
  return {
    url: `http://127.0.0.1:${port}/api/payments/webhook`,
    hits,
    /** The next answers, in order (e.g. [500] fails the next delivery once). */
    answerWith: (...statuses: number[]) => answers.push(...statuses),
    clear: () => {
      hits.length = 0;
      answers.length = 0;
    },
    close: () => {
      server.closeAllConnections();
      return new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}

/** Polls until `check` holds (or fails after `ms`). */
export async function until(check: () => boolean, ms = 5000, what = "condition"): Promise<void> {
  const end = Date.now() + ms;
  while (!check()) {
    if (Date.now() > end) throw new Error(`Timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 10));
  }
}
