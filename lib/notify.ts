/** Team e-mails about alternatives (product.md, flow step 9). Sending never blocks the change itself. */
import { sendMail } from "./mail";
import { teamAddresses } from "@/db/queries/alternatives";
import { CAUTION } from "./caution";

const appUrl = () => process.env.NEXTAUTH_URL ?? "http://127.0.0.1:3000";

export async function notifyProposal(args: { workspaceId: string; markLabel: string; candidateId: string; proposer: string; comment: string }) {
  const to = await teamAddresses(args.workspaceId, ["owner", "engineer"]);
  const subject = `Alternative proposed for column ${args.markLabel}: ${args.candidateId}`;
  const text = [
    `${args.proposer} proposed ${args.candidateId} for column mark ${args.markLabel}.`,
    args.comment ? `Comment: ${args.comment}` : "",
    `Review it in Caryatid: ${appUrl()}`,
    "",
    CAUTION,
  ].filter(Boolean).join("\n");
  await Promise.all(to.map((address) => sendMail({ to: address, subject, text, workspaceId: args.workspaceId }).catch(() => undefined)));
}

export async function notifyDecision(args: {
  workspaceId: string;
  markLabel: string;
  candidateId: string;
  decision: "approved" | "rejected";
  decider: string;
  comment: string;
  proposerEmail: string | null;
}) {
  const team = await teamAddresses(args.workspaceId, ["owner", "engineer", "estimator"]);
  const to = [...new Set([...team, ...(args.proposerEmail ? [args.proposerEmail] : [])])];
  const subject = `Alternative ${args.decision} for column ${args.markLabel}: ${args.candidateId}`;
  const text = [
    `${args.decider} ${args.decision} ${args.candidateId} for column mark ${args.markLabel}.`,
    args.comment ? `Comment: ${args.comment}` : "",
    `Open Caryatid: ${appUrl()}`,
    "",
    CAUTION,
  ].filter(Boolean).join("\n");
  await Promise.all(to.map((address) => sendMail({ to: address, subject, text, workspaceId: args.workspaceId }).catch(() => undefined)));
}
