// Runs the local payment stand-in (lib/payments/fake/server.ts) until SIGTERM, on STRIPE_API_URL's
// port; webhooks go to STRIPE_FAKE_WEBHOOK_URL. Settings: paymentsFakeSettings in lib/env.ts.
import { paymentsFakeSettings } from "@/lib/env";
import { startPaymentsFake } from "@/lib/payments/fake/server";

const settings = paymentsFakeSettings();
const address = new URL(settings.STRIPE_API_URL);

startPaymentsFake({
  port: Number(address.port || 80),
  host: address.hostname.replace(/^\[|\]$/g, ""),
  webhookUrl: settings.STRIPE_FAKE_WEBHOOK_URL ?? null,
  secretKey: settings.STRIPE_SECRET_KEY,
  webhookSecret: settings.STRIPE_WEBHOOK_SECRET,
  dataFile: settings.STRIPE_FAKE_DATA_FILE ?? null,
  asyncDelayMs: settings.STRIPE_FAKE_ASYNC_DELAY_MS,
  webhooks: {
    retryBaseMs: settings.STRIPE_FAKE_RETRY_BASE_MS,
    maxAttempts: settings.STRIPE_FAKE_MAX_ATTEMPTS,
    duplicateDeliveries: settings.STRIPE_FAKE_DUPLICATES,
    shuffle: settings.STRIPE_FAKE_SHUFFLE === "off" ? false : settings.STRIPE_FAKE_SHUFFLE,
  },
})
  .then((fake) => {
    console.log(`[payments] API and checkout pages on ${fake.url}; webhooks to ${settings.STRIPE_FAKE_WEBHOOK_URL ?? "(none: recorded only)"}`);
    const stop = () => fake.close().then(() => process.exit(0));
    process.on("SIGTERM", stop);
    process.on("SIGINT", stop);
  })
  .catch((err: Error) => {
    console.error(`[payments] could not start: ${err.message}`);
    process.exit(1);
  });
