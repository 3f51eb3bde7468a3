import type { Metadata } from "next";
import Link from "next/link";
import { AppShell } from "@/components/app-shell/app-shell";
import { AccountNameForm, PasswordChangeForm } from "@/components/auth/account-forms";
import { requirePageUser } from "@/lib/auth/page-access";
import { findUserById } from "@/db/queries/users";
import { listWorkspacesOf } from "@/db/queries/workspaces";
import { SESSION_MAX_AGE_SECONDS } from "@/lib/auth/options";

export const metadata: Metadata = { title: "Account" };
export const dynamic = "force-dynamic";

export default async function AccountPage() {
  const user = await requirePageUser("/account");
  const [row, workspaces] = await Promise.all([findUserById(user.id), listWorkspacesOf(user.id)]);
  const name = row?.name ?? user.name;
  return (
    <AppShell user={{ name, email: user.email }} workspaces={workspaces}>
      <div className="mx-auto max-w-3xl space-y-6">
        <div>
          <h1 className="text-2xl font-semibold tracking-tight">Account</h1>
          <p className="mt-1 text-sm text-ink-500">
            Signed in as {user.email}. Sessions end after {SESSION_MAX_AGE_SECONDS / 3600} hours without use, or when you sign out.
          </p>
        </div>
        <div className="grid gap-6 md:grid-cols-2">
          <section aria-labelledby="profile-heading" className="panel space-y-4">
            <h2 id="profile-heading" className="text-base font-semibold">
              Profile
            </h2>
            <AccountNameForm name={name} />
          </section>
          <section aria-labelledby="password-heading" className="panel space-y-4">
            <h2 id="password-heading" className="text-base font-semibold">
              Password
            </h2>
            {row?.passwordHash ? (
              <PasswordChangeForm />
            ) : (
              <p className="text-sm text-ink-500">You sign in with one-time links; this account has no password.</p>
            )}
          </section>
        </div>
        <section aria-labelledby="workspaces-heading" className="panel space-y-3">
          <h2 id="workspaces-heading" className="text-base font-semibold">
            Your workspaces
          </h2>
          {workspaces.length === 0 ? (
            <p className="text-sm text-ink-500">
              None yet. <Link href="/w?new=1" className="font-medium text-oxide-700 underline">Start a workspace</Link> or ask a colleague to invite you.
            </p>
          ) : (
            <ul className="divide-y divide-stone-100">
              {workspaces.map((w) => (
                <li key={w.id} className="flex flex-wrap items-center gap-3 py-2 text-sm">
                  <Link href={`/w/${w.id}`} className="font-medium text-ink-900 underline-offset-2 hover:underline">
                    {w.name}
                  </Link>
                  <span className="capitalize text-ink-500">{w.role}</span>
                  <Link href={`/w/${w.id}/members`} className="ml-auto text-ink-500 hover:text-ink-900">
                    Members
                  </Link>
                </li>
              ))}
            </ul>
          )}
          <Link href="/w?new=1" className="btn-quiet">
            Start another workspace
          </Link>
        </section>
      </div>
    </AppShell>
  );
}
