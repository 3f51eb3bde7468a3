/**
 * The mail outbox: a message is stored before it is sent, a send that fails while the catcher is
 * unreachable stays in the outbox as "failed", and the owner's retry delivers it to the catcher.
 */
import { afterAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { closeDb, testDb } from "./support/database";
import { callRoute } from "./support/session";
import { createTestWorkspace, uniqueEmail } from "./support/fixtures";
import { listCaughtMail, waitForMail } from "./support/mail-catcher";
import { mailOutbox } from "@/db/schema";
import { resetMailTransport } from "@/lib/mail";
import { POST as invite } from "@/app/api/workspaces/[workspaceId]/invitations/route";
import { GET as listMail } from "@/app/api/workspaces/[workspaceId]/mail/route";
import { POST as retryMail } from "@/app/api/workspaces/[workspaceId]/mail/retry/route";

afterAll(closeDb);

// A loopback port nothing listens on: connecting is refused at once.
const DEAD_PORT = "9";

describe("mail while the catcher is down", () => {
  it("keeps the invitation and its mail as failed, then delivers it on retry", async () => {
    const ws = await createTestWorkspace();
    const email = uniqueEmail("offline");
    const livePort = process.env.SMTP_PORT;
    process.env.SMTP_PORT = DEAD_PORT;
    resetMailTransport();
    try {
      const res = await callRoute<{ mail: { id: string; status: string } }>(invite, `/api/workspaces/${ws.id}/invitations`, {
        method: "POST", user: ws.members.owner, params: { workspaceId: ws.id }, body: { email, role: "engineer" },
      });
      expect(res.status).toBe(201);
      expect(res.json.mail.status).toBe("failed");
      const [row] = await testDb().select().from(mailOutbox).where(eq(mailOutbox.id, res.json.mail.id));
      expect(row).toMatchObject({ status: "failed", attempts: 1, to: email, workspaceId: ws.id });
      expect(row?.lastError).toBeTruthy();
      expect(await listCaughtMail(email)).toEqual([]);
    } finally {
      process.env.SMTP_PORT = livePort;
      resetMailTransport();
    }

    const retried = await callRoute<{ sent: number }>(retryMail, `/api/workspaces/${ws.id}/mail/retry`, {
      method: "POST", user: ws.members.owner, params: { workspaceId: ws.id },
    });
    expect(retried.json.sent).toBe(1);
    const caught = await waitForMail(email, { subject: "Join" });
    expect(caught.text).toContain("/invitations/accept?token=");

    const list = await callRoute<{ messages: { to: string; status: string; attempts: number }[] }>(listMail, `/api/workspaces/${ws.id}/mail`, {
      user: ws.members.owner, params: { workspaceId: ws.id },
    });
    expect(list.status).toBe(200);
    expect(list.json.messages).toEqual([expect.objectContaining({ to: email, status: "sent", attempts: 2 })]);
  });

  it("shows captured mail only while mail goes to the local catcher", async () => {
    const ws = await createTestWorkspace();
    const catcher = process.env.MAIL_CATCHER_URL;
    delete process.env.MAIL_CATCHER_URL;
    try {
      const res = await callRoute(listMail, `/api/workspaces/${ws.id}/mail`, { user: ws.members.owner, params: { workspaceId: ws.id } });
      expect(res.status).toBe(404);
    } finally {
      process.env.MAIL_CATCHER_URL = catcher;
    }
  });
});
