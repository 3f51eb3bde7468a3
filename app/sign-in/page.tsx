import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthFrame } from "@/components/auth/auth-frame";
import { EmailLinkForm, SignInForm } from "@/components/auth/sign-in-form";
import { getSessionUser } from "@/lib/auth/session";
import { safeCallbackPath } from "@/lib/validation/auth";

export const metadata: Metadata = { title: "Sign in" };

interface SignInPageProps {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}

function first(value: string | string[] | undefined): string | undefined {
  return Array.isArray(value) ? value[0] : value;
}

export default async function SignInPage({ searchParams }: SignInPageProps) {
  const params = await searchParams;
  const callbackUrl = safeCallbackPath(first(params.callbackUrl));
  if (await getSessionUser()) redirect(callbackUrl);
  return (
    <AuthFrame
      title="Sign in"
      lead="Sign in to your firm's workspace."
      footer={
        <p>
          New to Caryatid?{" "}
          <Link href={`/sign-up?callbackUrl=${encodeURIComponent(callbackUrl)}`} className="font-medium text-oxide-700 underline">
            Create an account
          </Link>
        </p>
      }
    >
      <SignInForm callbackUrl={callbackUrl} initialEmail={first(params.email) ?? ""} initialError={first(params.error)} />
      <EmailLinkForm callbackUrl={callbackUrl} />
    </AuthFrame>
  );
}
