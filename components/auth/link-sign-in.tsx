"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { signIn } from "next-auth/react";
import Link from "next/link";
import { FormAlert, useHydrated } from "./form-parts";

export interface LinkSignInProps {
  email: string;
  token: string;
  callbackUrl: string;
}

/**
 * The landing of a one-time link. Signing in waits for a click, so a mail scanner that opens the
 * link does not use it up.
 */
export function LinkSignIn({ email, token, callbackUrl }: LinkSignInProps) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const hydrated = useHydrated();
  const [failed, setFailed] = useState(false);

  async function onClick() {
    setBusy(true);
    setFailed(false);
    const result = await signIn("email-link", { email, token, redirect: false, callbackUrl });
    if (!result || result.error) {
      setFailed(true);
      setBusy(false);
      return;
    }
    router.replace(callbackUrl);
    router.refresh();
  }

  return (
    <div className="panel space-y-4">
      {failed ? (
        <FormAlert>
          This link has already been used or has expired. <Link href="/sign-in" className="underline">Ask for a new one</Link>.
        </FormAlert>
      ) : null}
      <p className="text-sm text-ink-700">
        Signing in as <strong className="text-ink-900">{email}</strong>.
      </p>
      <button type="button" className="btn-primary w-full justify-center" onClick={onClick} disabled={!hydrated || busy} autoFocus>
        {busy ? "Signing in…" : "Sign in to Caryatid"}
      </button>
    </div>
  );
}
