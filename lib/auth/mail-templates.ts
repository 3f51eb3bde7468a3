/**
 * The messages sign-in and invitations send. Every value that came from a person (names, the
 * workspace name) is HTML-escaped in the HTML part; the text part is plain text already.
 */
import type { Role } from "@/lib/permissions";

export function appBaseUrl(): string {
  return (process.env.NEXTAUTH_URL ?? "http://127.0.0.1:3000").replace(/\/+$/, "");
}

export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c] ?? c);
}

function layout(body: string): string {
  return `<!doctype html><html><body style="font-family:system-ui,sans-serif;color:#1b2129;background:#fbfaf7;padding:24px">${body}<p style="color:#56606b;font-size:12px">Caryatid · sent because someone used this address in the app. If that was not you, ignore this message.</p></body></html>`;
}

export function signInLinkMail(link: string, minutes: number) {
  return {
    subject: "Your Caryatid sign-in link",
    text: `Sign in to Caryatid with this link (it works once and expires in ${minutes} minutes):\n\n${link}\n\nIf you did not ask for it, ignore this message.`,
    html: layout(
      `<p>Sign in to Caryatid with this link. It works once and expires in ${minutes} minutes.</p><p><a href="${escapeHtml(link)}">Sign in to Caryatid</a></p>`,
    ),
  };
}

export function invitationMail(input: { link: string; workspaceName: string; inviterName: string; role: Role; days: number }) {
  const inviter = input.inviterName || "A colleague";
  return {
    subject: `Join ${input.workspaceName} on Caryatid`,
    text:
      `${inviter} invites you to the workspace "${input.workspaceName}" on Caryatid as ${input.role}.\n\n` +
      `Accept the invitation (the link works once and expires in ${input.days} days):\n\n${input.link}\n`,
    html: layout(
      `<p>${escapeHtml(inviter)} invites you to the workspace <strong>${escapeHtml(input.workspaceName)}</strong> on Caryatid as <strong>${escapeHtml(input.role)}</strong>.</p>` +
        `<p><a href="${escapeHtml(input.link)}">Accept the invitation</a></p><p>The link works once and expires in ${input.days} days.</p>`,
    ),
  };
}
