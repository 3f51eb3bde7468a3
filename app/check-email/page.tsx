import type { Metadata } from "next";
import Link from "next/link";
import { AuthFrame } from "@/components/auth/auth-frame";
import { capturedMailVisible } from "@/lib/mail";

export const metadata: Metadata = { title: "Check your e-mail" };

interface CheckEmailPageProps {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}

export default async function CheckEmailPage({ searchParams }: CheckEmailPageProps) {
  const params = await searchParams;
  const email = (Array.isArray(params.email) ? params.email[0] : params.email)?.slice(0, 254);
  const catcher = capturedMailVisible() ? process.env.MAIL_CATCHER_URL : undefined;
  return (
    <AuthFrame title="Check your e-mail">
      <div className="panel space-y-3 text-sm text-ink-700">
        <p>
          If an account uses {email ? <strong className="text-ink-900">{email}</strong> : "that address"}, a sign-in link is on its way. It
          works once, within 15 minutes.
        </p>
        <p>Nothing arrived? Look in the junk folder, or ask again in a minute.</p>
        {catcher ? (
          <p className="rounded-md bg-stone-50 px-3 py-2 text-xs text-ink-500">
            Local development: outgoing mail is caught, not delivered. Read it at <code className="font-mono">{catcher}/messages</code>.
          </p>
        ) : null}
      </div>
      <p className="text-sm">
        <Link href="/sign-in" className="font-medium text-oxide-700 underline">Back to sign in</Link>
      </p>
    </AuthFrame>
  );
}
