import "server-only";
import { mailOutbox } from "@/db/schema";
import type { Database } from "@/db/client";
import { renderMail, type MailTemplate } from "./templates";

type Tx = Pick<Database, "insert">;

/** Queue a message inside the caller's transaction: it is sent only if the cause commits. */
export async function enqueueMail(tx: Tx, to: string, message: MailTemplate): Promise<void> {
  const rendered = renderMail(message);
  await tx.insert(mailOutbox).values({ template: message.template, toAddress: to, ...rendered });
}
