import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthFrame } from "@/components/auth/auth-frame";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { getSessionUser } from "@/lib/auth/session";
import { safeCallbackPath } from "@/lib/validation/auth";

export const metadata: Metadata = { title: "Create an account" };

interface SignUpPageProps {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}

export default async function SignUpPage({ searchParams }: SignUpPageProps) {
  const params = await searchParams;
  const raw = params.callbackUrl;
  const callbackUrl = safeCallbackPath(Array.isArray(raw) ? raw[0] : raw);
  if (await getSessionUser()) redirect(callbackUrl);
  return (
    <AuthFrame
      title="Create an account"
      lead="After signing up you can start a workspace for your firm, or accept an invitation from a colleague."
      footer={
        <p>
          Already have an account?{" "}
          <Link href={`/sign-in?callbackUrl=${encodeURIComponent(callbackUrl)}`} className="font-medium text-oxide-700 underline">
            Sign in
          </Link>
        </p>
      }
    >
      <SignUpForm callbackUrl={callbackUrl} />
    </AuthFrame>
  );
}
