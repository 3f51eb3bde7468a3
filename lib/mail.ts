/**
 * Outgoing mail. Every message is written to the mail_outbox table first, then sent through
 * nodemailer to SMTP_HOST:SMTP_PORT (the local catcher in development and tests). A failed send
 * stays "failed" with its error and is retried by `deliverPendingMail`, so nothing is lost when
 * the SMTP server is down.
 */
import nodemailer, { type Transporter } from "nodemailer";
import { and, desc, eq, inArray, lt } from "drizzle-orm";
import { getDb } from "@/db/client";
import { mailOutbox } from "@/db/schema";

export const MAIL_FROM = process.env.MAIL_FROM ?? "Caryatid <no-reply@caryatid.local>";
const MAX_ATTEMPTS = 8;

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  workspaceId?: string | null;
}

let transport: Transporter | null = null;

function getTransport(): Transporter {
  if (!transport) {
    transport = nodemailer.createTransport({
      host: process.env.SMTP_HOST ?? "127.0.0.1",
      port: Number(process.env.SMTP_PORT ?? 2525),
      secure: false,
      ignoreTLS: process.env.SMTP_REQUIRE_TLS !== "1",
      connectionTimeout: 3000,
      greetingTimeout: 3000,
      socketTimeout: 5000,
    });
  }
  return transport;
}

type OutboxRow = typeof mailOutbox.$inferSelect;

async function attemptSend(row: OutboxRow): Promise<boolean> {
  const db = getDb();
  try {
    await getTransport().sendMail({ from: MAIL_FROM, to: row.to, subject: row.subject, text: row.text, html: row.html ?? undefined });
    await db
      .update(mailOutbox)
      .set({ status: "sent", sentAt: new Date(), attempts: row.attempts + 1, lastError: null, updatedAt: new Date() })
      .where(eq(mailOutbox.id, row.id));
    return true;
  } catch (error) {
    await db
      .update(mailOutbox)
      .set({
        status: "failed",
        attempts: row.attempts + 1,
        lastError: error instanceof Error ? error.message.slice(0, 500) : "send failed",
        updatedAt: new Date(),
      })
      .where(eq(mailOutbox.id, row.id));
    return false;
  }
}

/** Records the message in the outbox and tries to send it at once. Returns the outbox row id. */
export async function sendMail(mail: OutgoingMail): Promise<{ id: string; sent: boolean }> {
  const [row] = await getDb()
    .insert(mailOutbox)
    .values({ to: mail.to, subject: mail.subject, text: mail.text, html: mail.html ?? null, workspaceId: mail.workspaceId ?? null })
    .returning();
  if (!row) throw new Error("mail outbox insert returned nothing");
  return { id: row.id, sent: await attemptSend(row) };
}

/**
 * Retries every pending or failed message that has attempts left (only one workspace's when
 * given). Returns how many were sent.
 */
export async function deliverPendingMail(options: { workspaceId?: string } = {}): Promise<number> {
  const open = and(inArray(mailOutbox.status, ["pending", "failed"]), lt(mailOutbox.attempts, MAX_ATTEMPTS));
  const rows = await getDb()
    .select()
    .from(mailOutbox)
    .where(options.workspaceId ? and(open, eq(mailOutbox.workspaceId, options.workspaceId)) : open);
  let sent = 0;
  for (const row of rows) if (await attemptSend(row)) sent++;
  return sent;
}

/** For tests: forget the cached transport so a changed SMTP_PORT takes effect. */
export function resetMailTransport(): void {
  transport = null;
}

/**
 * Whether captured mail may be shown in the app: only while mail goes to the local catcher
 * (development and tests set MAIL_CATCHER_URL), never against a real SMTP host.
 */
export function capturedMailVisible(): boolean {
  return Boolean(process.env.MAIL_CATCHER_URL) || process.env.CARYATID_SHOW_CAPTURED_MAIL === "1";
}

/** The newest messages of one workspace's outbox, with their delivery status. */
export async function listWorkspaceMail(workspaceId: string, limit = 100) {
  const rows = await getDb()
    .select({
      id: mailOutbox.id,
      to: mailOutbox.to,
      subject: mailOutbox.subject,
      text: mailOutbox.text,
      status: mailOutbox.status,
      attempts: mailOutbox.attempts,
      lastError: mailOutbox.lastError,
      createdAt: mailOutbox.createdAt,
      sentAt: mailOutbox.sentAt,
    })
    .from(mailOutbox)
    .where(eq(mailOutbox.workspaceId, workspaceId))
    .orderBy(desc(mailOutbox.createdAt))
    .limit(limit);
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString(), sentAt: r.sentAt?.toISOString() ?? null }));
}
