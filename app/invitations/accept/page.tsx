import type { Metadata } from "next";
import Link from "next/link";
import { AuthFrame } from "@/components/auth/auth-frame";
import { JoinWorkspaceButton, NewcomerForm } from "@/components/auth/accept-invitation";
import { SignOutButton } from "@/components/auth/sign-out-button";
import { describeInvitation } from "@/db/queries/invitations";
import { getSessionUser } from "@/lib/auth/session";
import { invitationTokenSchema } from "@/lib/validation/members";

// The token is in the address: never send it on as a Referer.
export const metadata: Metadata = { title: "Accept invitation", referrer: "no-referrer" };
export const dynamic = "force-dynamic";

interface AcceptPageProps {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}

const ROLE_MEANING: Record<string, string> = {
  owner: "manage members and everything in the workspace",
  engineer: "edit columns and loads, run searches, adopt and approve alternatives",
  estimator: "edit price books, run searches and propose alternatives",
  reviewer: "read everything, comment and download reports",
};

export default async function AcceptInvitationPage({ searchParams }: AcceptPageProps) {
  const params = await searchParams;
  const parsed = invitationTokenSchema.safeParse(Array.isArray(params.token) ? params.token[0] : params.token);
  const invitation = parsed.success ? await describeInvitation(parsed.data) : null;

  if (!parsed.success || !invitation) {
    return (
      <AuthFrame title="This invitation link is not valid">
        <div className="panel text-sm text-ink-700">
          It may have been replaced by a newer invitation or withdrawn. Ask the workspace owner to invite you again.
        </div>
      </AuthFrame>
    );
  }
  if (invitation.state !== "open") {
    return (
      <AuthFrame title={invitation.state === "used" ? "This invitation has been used" : "This invitation has expired"}>
        <div className="panel space-y-3 text-sm text-ink-700">
          <p>
            {invitation.state === "used"
              ? "The link works once, and it already has. If that was you, sign in to reach the workspace."
              : `Invitations work for 7 days. Ask the owner of ${invitation.workspaceName} to invite you again.`}
          </p>
          <Link href="/sign-in" className="btn-quiet">Go to sign in</Link>
        </div>
      </AuthFrame>
    );
  }

  const token = parsed.data;
  const user = await getSessionUser();
  const here = `/invitations/accept?token=${encodeURIComponent(token)}`;
  const lead = (
    <p>
      {invitation.inviterName || "A colleague"} invites you to <strong className="text-ink-900">{invitation.workspaceName}</strong> as{" "}
      <strong className="text-ink-900">{invitation.role}</strong> — you may {ROLE_MEANING[invitation.role]}.
    </p>
  );

  let body;
  if (user && user.email.toLowerCase() === invitation.email) {
    body = <JoinWorkspaceButton token={token} workspaceName={invitation.workspaceName} />;
  } else if (user) {
    body = (
      <div className="space-y-3 text-sm text-ink-700">
        <p>
          The invitation was sent to <strong className="text-ink-900">{invitation.email}</strong>, but you are signed in as{" "}
          <strong className="text-ink-900">{user.email}</strong>. Sign out, then accept with the invited address.
        </p>
        <SignOutButton callbackUrl={here} />
      </div>
    );
  } else if (invitation.accountExists) {
    body = (
      <div className="space-y-3 text-sm text-ink-700">
        <p>
          An account already uses <strong className="text-ink-900">{invitation.email}</strong>. Sign in to accept.
        </p>
        <Link href={`/sign-in?email=${encodeURIComponent(invitation.email)}&callbackUrl=${encodeURIComponent(here)}`} className="btn-primary">
          Sign in to accept
        </Link>
      </div>
    );
  } else {
    body = <NewcomerForm token={token} email={invitation.email} />;
  }

  return (
    <AuthFrame title={`Join ${invitation.workspaceName}`} lead={lead}>
      <div className="panel">{body}</div>
    </AuthFrame>
  );
}
