"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { signIn } from "next-auth/react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { signInSchema, emailLinkRequestSchema } from "@/lib/validation/auth";
import { fetchJson } from "@/components/providers";
import { applyServerErrors, FormAlert, TextField, useHydrated } from "./form-parts";

export interface SignInFormProps {
  callbackUrl: string;
  initialEmail?: string;
  /** an error code next-auth put on the URL (e.g. after an expired link) */
  initialError?: string;
}

/** Messages for next-auth's error codes; the codes themselves never reach the person. */
export function describeSignInError(code: string | null | undefined): string | null {
  if (!code) return null;
  if (code === "RateLimited") return "Too many failed attempts for this address. Wait 15 minutes, or sign in with a one-time link.";
  if (code === "CredentialsSignin") return "The e-mail address or the password is not right.";
  if (code === "SessionRequired") return "Sign in to continue.";
  return "Signing in did not work. Try again.";
}

export function SignInForm({ callbackUrl, initialEmail = "", initialError }: SignInFormProps) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(describeSignInError(initialError));
  const form = useForm({ resolver: zodResolver(signInSchema), defaultValues: { email: initialEmail, password: "" }, mode: "onTouched" });
  const { errors, isSubmitting } = form.formState;
  const hydrated = useHydrated();

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    const result = await signIn("password", { email: values.email, password: values.password, redirect: false, callbackUrl });
    if (!result || result.error) {
      setFormError(describeSignInError(result?.error ?? "CredentialsSignin"));
      form.setValue("password", "");
      return;
    }
    router.replace(callbackUrl);
    router.refresh();
  });

  return (
    <form method="post" onSubmit={onSubmit} noValidate className="panel space-y-4" aria-labelledby="password-heading">
      <h2 id="password-heading" className="text-base font-semibold text-ink-900">
        With your password
      </h2>
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      <TextField label="E-mail" type="email" autoComplete="email" autoFocus error={errors.email?.message} {...form.register("email")} />
      <TextField label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...form.register("password")} />
      <button type="submit" className="btn-primary w-full justify-center" disabled={!hydrated || isSubmitting}>
        {isSubmitting ? "Signing in…" : "Sign in"}
      </button>
    </form>
  );
}

export interface EmailLinkFormProps {
  callbackUrl: string;
}

/** Asks for a one-time sign-in link and moves on to "check your e-mail". */
export function EmailLinkForm({ callbackUrl }: EmailLinkFormProps) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm({ resolver: zodResolver(emailLinkRequestSchema), defaultValues: { email: "", callbackUrl }, mode: "onTouched" });
  const { errors, isSubmitting } = form.formState;
  const hydrated = useHydrated();

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await fetchJson("/api/auth/email-link", { body: values });
      router.push(`/check-email?kind=link&email=${encodeURIComponent(values.email)}`);
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["email"]));
    }
  });

  return (
    <form method="post" onSubmit={onSubmit} noValidate className="panel space-y-4" aria-labelledby="link-heading">
      <div>
        <h2 id="link-heading" className="text-base font-semibold text-ink-900">
          With a one-time link
        </h2>
        <p className="mt-1 text-sm text-ink-500">We e-mail you a link that signs you in once, within 15 minutes.</p>
      </div>
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      <TextField label="E-mail for the link" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <button type="submit" className="btn-quiet w-full justify-center" disabled={!hydrated || isSubmitting}>
        {isSubmitting ? "Sending…" : "E-mail me a link"}
      </button>
    </form>
  );
}
