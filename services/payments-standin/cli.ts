import path from "node:path";

import { startPaymentsStandin } from "./index";

function readPort(raw: string | undefined): number {
  const port = Number(raw ?? "4242");
  if (!Number.isInteger(port) || port < 0 || port > 65535) throw new Error(`PAYMENTS_PORT must be a port number, got "${raw}"`);
  return port;
}

async function main(): Promise<void> {
  const webhookSecret = process.env.STRIPE_WEBHOOK_SECRET;
  if (!webhookSecret) throw new Error("STRIPE_WEBHOOK_SECRET must be set (for example whsec_local_dev)");
  const dataDir = process.env.DATA_DIR;
  const standin = await startPaymentsStandin({
    port: readPort(process.env.PAYMENTS_PORT),
    webhookSecret,
    webhookUrl: process.env.PAYMENTS_WEBHOOK_URL || undefined,
    publicUrl: process.env.PAYMENTS_PUBLIC_URL || undefined,
    dataFile: dataDir ? path.join(dataDir, "payments-standin.json") : undefined,
  });
  console.log(`[payments-standin] listening on ${standin.url}`);
  console.log(`[payments-standin] webhooks -> ${process.env.PAYMENTS_WEBHOOK_URL || "(none: PAYMENTS_WEBHOOK_URL unset)"}`);

  const stop = () => {
    standin.close().then(
      () => process.exit(0),
      (err: unknown) => {
        console.error(err);
        process.exit(1);
      },
    );
  };
  process.once("SIGINT", stop);
  process.once("SIGTERM", stop);
}

main().catch((err: unknown) => {
  console.error(`[payments-standin] ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
