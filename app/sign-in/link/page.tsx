import type { Metadata } from "next";
import Link from "next/link";
import { AuthFrame } from "@/components/auth/auth-frame";
import { LinkSignIn } from "@/components/auth/link-sign-in";
import { safeCallbackPath } from "@/lib/validation/auth";

// The token is in the address: never send it on as a Referer.
export const metadata: Metadata = { title: "Sign in with your link", referrer: "no-referrer" };

interface LinkPageProps {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}

const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v) ?? "";

export default async function LinkPage({ searchParams }: LinkPageProps) {
  const params = await searchParams;
  const email = one(params.email);
  const token = one(params.token);
  const callbackUrl = safeCallbackPath(one(params.callbackUrl));
  if (!email || !token) {
    return (
      <AuthFrame title="This link is incomplete">
        <div className="panel text-sm text-ink-700">
          The sign-in link is missing a part. Copy the whole link from the message, or{" "}
          <Link href="/sign-in" className="font-medium text-oxide-700 underline">ask for a new one</Link>.
        </div>
      </AuthFrame>
    );
  }
  return (
    <AuthFrame title="Sign in with your link" lead="The link works once and for 15 minutes after it was sent.">
      <LinkSignIn email={email} token={token} callbackUrl={callbackUrl} />
    </AuthFrame>
  );
}
