"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { signIn } from "next-auth/react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { newcomerSchema } from "@/lib/validation/members";
import { PASSWORD_MIN_LENGTH } from "@/lib/auth/password-policy";
import { fetchJson } from "@/components/providers";
import { applyServerErrors, FormAlert, TextField, useHydrated } from "./form-parts";

interface Accepted {
  workspaceId: string;
  role: string;
  email?: string;
}

export interface JoinWorkspaceButtonProps {
  token: string;
  workspaceName: string;
}

/** Signed in with the invited address: one click joins. */
export function JoinWorkspaceButton({ token, workspaceName }: JoinWorkspaceButtonProps) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const hydrated = useHydrated();
  async function onClick() {
    setBusy(true);
    setError(null);
    try {
      const accepted = await fetchJson<Accepted>("/api/auth/invitations/accept", { body: { token } });
      router.replace(`/w/${accepted.workspaceId}`);
      router.refresh();
    } catch (e) {
      setError(e instanceof Error ? e.message : "accepting did not work; try again");
      setBusy(false);
    }
  }
  return (
    <div className="space-y-3">
      {error ? <FormAlert>{error}</FormAlert> : null}
      <button type="button" className="btn-primary w-full justify-center" onClick={onClick} disabled={!hydrated || busy} autoFocus>
        {busy ? "Joining…" : `Join ${workspaceName}`}
      </button>
    </div>
  );
}

export interface NewcomerFormProps {
  token: string;
  email: string;
}

/** Not signed in and no account yet: choose a name and password for the invited address. */
export function NewcomerForm({ token, email }: NewcomerFormProps) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm({ resolver: zodResolver(newcomerSchema), defaultValues: { name: "", password: "" }, mode: "onTouched" });
  const { errors, isSubmitting } = form.formState;
  const hydrated = useHydrated();

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    let accepted: Accepted;
    try {
      accepted = await fetchJson<Accepted>("/api/auth/invitations/accept", { body: { token, ...values } });
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["name", "password"]));
      return;
    }
    const result = await signIn("password", { email, password: values.password, redirect: false });
    if (!result || result.error) {
      router.push(`/sign-in?email=${encodeURIComponent(email)}&callbackUrl=${encodeURIComponent(`/w/${accepted.workspaceId}`)}`);
      return;
    }
    router.replace(`/w/${accepted.workspaceId}`);
    router.refresh();
  });

  return (
    <form method="post" onSubmit={onSubmit} noValidate className="space-y-4">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      <TextField label="E-mail" type="email" value={email} readOnly hint="The invitation was sent to this address." />
      <TextField label="Your name" autoComplete="name" autoFocus error={errors.name?.message} {...form.register("name")} />
      <TextField
        label="Choose a password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        error={errors.password?.message}
        {...form.register("password")}
      />
      <button type="submit" className="btn-primary w-full justify-center" disabled={!hydrated || isSubmitting}>
        {isSubmitting ? "Joining…" : "Create account and join"}
      </button>
    </form>
  );
}
