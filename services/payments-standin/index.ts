import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";

import type { StandinContext } from "./core/context";
import { sweepExpiredSessions } from "./core/sessions";
import type { StandinState } from "./core/state";
import { Store } from "./core/store";
import { createRequestListener } from "./http/server";
import { EventBus } from "./webhooks/events";

export type { StandinState } from "./core/state";
export type * from "./types";

export interface PaymentsStandinOptions {
  /** 0 picks a free port; read the bound one from the result. */
  port: number;
  host?: string;
  webhookUrl?: string;
  webhookSecret: string;
  /** Base of the hosted page links, when browsers reach the stand-in by another address. */
  publicUrl?: string;
  /** JSON file that keeps the state across restarts; without it the state lives in memory only. */
  dataFile?: string;
  webhookRetry?: { attempts?: number; baseDelayMs?: number; timeoutMs?: number };
}

export interface PaymentsStandin {
  url: string;
  port: number;
  state: StandinState;
  close(): Promise<void>;
}

function listen(server: Server, port: number, host: string): Promise<void> {
  return new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, host, () => {
      server.off("error", reject);
      resolve();
    });
  });
}

export async function startPaymentsStandin(opts: PaymentsStandinOptions): Promise<PaymentsStandin> {
  if (!opts.webhookSecret) throw new Error("payments stand-in: webhookSecret is required");
  const host = opts.host ?? "127.0.0.1";
  const store = new Store(opts.dataFile);
  const events = new EventBus(store, {
    url: opts.webhookUrl,
    secret: opts.webhookSecret,
    attempts: opts.webhookRetry?.attempts ?? 5,
    baseDelayMs: opts.webhookRetry?.baseDelayMs ?? 500,
    timeoutMs: opts.webhookRetry?.timeoutMs ?? 10_000,
  });
  let publicUrl = "";
  const ctx: StandinContext = { store, events, publicUrl: () => publicUrl };

  const server = createServer(createRequestListener(ctx));
  await listen(server, opts.port, host);
  const { port } = server.address() as AddressInfo;
  const url = `http://${host.includes(":") ? `[${host}]` : host}:${port}`;
  publicUrl = (opts.publicUrl ?? url).replace(/\/+$/, "");

  const sweeper = setInterval(() => sweepExpiredSessions(ctx), 1000);
  sweeper.unref();

  let closing: Promise<void> | undefined;
  const close = (): Promise<void> => {
    closing ??= (async () => {
      clearInterval(sweeper);
      const closed = new Promise<void>((resolve) => server.close(() => resolve()));
      server.closeAllConnections();
      await events.close();
      store.persist();
      await closed;
    })();
    return closing;
  };

  return { url, port, state: store.state, close };
}
