// Runs the local SMTP catcher (lib/email/fake-smtp-catcher.ts) until SIGTERM.
import { startCatcher } from "@/lib/email/fake-smtp-catcher";

const smtpPort = Number(process.env.SMTP_PORT ?? 2525);
const httpPort = Number(new URL(process.env.MAIL_CATCHER_URL ?? "http://127.0.0.1:2580").port);

startCatcher({ smtpPort, httpPort })
  .then((catcher) => {
    console.log(`[mail-catcher] SMTP on 127.0.0.1:${smtpPort}, inbox API on http://127.0.0.1:${httpPort}/messages`);
    const stop = () => catcher.close().then(() => process.exit(0));
    process.on("SIGTERM", stop);
    process.on("SIGINT", stop);
  })
  .catch((err) => {
    console.error(`[mail-catcher] could not start: ${err.message}`);
    process.exit(1);
  });
