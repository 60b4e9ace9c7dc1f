import { createServer, type IncomingMessage } from "node:http";
import type { AddressInfo } from "node:net";

export interface ReceivedWebhook {
  body: string;
  signature: string | null;
  type: string;
  id: string;
}

/** A tiny endpoint that keeps every delivery; it can be told to fail the next few. */
export async function startWebhookReceiver() {
  const received: ReceivedWebhook[] = [];
  let failuresLeft = 0;
  let failStatus = 500;

  const read = async (req: IncomingMessage) => {
    const chunks: Buffer[] = [];
    for await (const chunk of req) chunks.push(chunk as Buffer);
    return Buffer.concat(chunks).toString("utf8");
  };

  const server = createServer((req, res) => {
    read(req).then((body) => {
      if (failuresLeft > 0) {
        failuresLeft -= 1;
        res.writeHead(failStatus).end("not now");
        return;
      }
      const parsed = JSON.parse(body) as { id: string; type: string };
      const signature = req.headers["stripe-signature"];
      received.push({ body, signature: typeof signature === "string" ? signature : null, type: parsed.type, id: parsed.id });
      res.writeHead(200, { "Content-Type": "application/json" }).end('{"received":true}');
    });
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const { port } = server.address() as AddressInfo;

  return {
    url: `http://127.0.0.1:${port}/webhooks`,
    received,
    failNext(count: number, status = 500) {
      failuresLeft = count;
      failStatus = status;
    },
    ofType(type: string) {
      return received.filter((w) => w.type === type);
    },
    async waitFor(type: string, match: (w: ReceivedWebhook) => boolean = () => true, timeoutMs = 5000): Promise<ReceivedWebhook> {
      const deadline = Date.now() + timeoutMs;
      for (;;) {
        const found = received.find((w) => w.type === type && match(w));
        if (found) return found;
        if (Date.now() > deadline)
          throw new Error(`no ${type} webhook within ${timeoutMs} ms; got ${received.map((w) => w.type).join(", ") || "none"}`);
        await new Promise((r) => setTimeout(r, 20));
      }
    },
    close: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}

export type WebhookReceiver = Awaited<ReturnType<typeof startWebhookReceiver>>;
