"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useSession } from "next-auth/react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { accountNameSchema, passwordChangeSchema } from "@/lib/validation/auth";
import { PASSWORD_MIN_LENGTH } from "@/lib/auth/password-policy";
import { fetchJson } from "@/components/providers";
import { applyServerErrors, FormAlert, TextField, useHydrated } from "./form-parts";

export interface AccountNameFormProps {
  name: string;
}

export function AccountNameForm({ name }: AccountNameFormProps) {
  const router = useRouter();
  const { update } = useSession();
  const [status, setStatus] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const form = useForm({ resolver: zodResolver(accountNameSchema), defaultValues: { name }, mode: "onTouched" });
  const { errors, isSubmitting } = form.formState;
  const hydrated = useHydrated();
  const onSubmit = form.handleSubmit(async (values) => {
    setStatus(null);
    try {
      const res = await fetchJson<{ user: { name: string } }>("/api/auth/account", { method: "PATCH", body: values });
      form.reset({ name: res.user.name });
      // The session carries the name; ask next-auth to re-read it from the database.
      await update();
      router.refresh();
      setStatus({ tone: "success", text: "Your name is saved." });
    } catch (error) {
      const message = applyServerErrors(error, form.setError, ["name"]);
      if (message) setStatus({ tone: "error", text: message });
    }
  });
  return (
    <form method="post" onSubmit={onSubmit} noValidate className="space-y-4">
      <TextField label="Name" autoComplete="name" error={errors.name?.message} {...form.register("name")} />
      <div aria-live="polite">{status ? <FormAlert tone={status.tone}>{status.text}</FormAlert> : null}</div>
      <button type="submit" className="btn-primary" disabled={!hydrated || isSubmitting}>
        {isSubmitting ? "Saving…" : "Save name"}
      </button>
    </form>
  );
}

export function PasswordChangeForm() {
  const [status, setStatus] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const form = useForm({
    resolver: zodResolver(passwordChangeSchema),
    defaultValues: { currentPassword: "", newPassword: "" },
    mode: "onTouched",
  });
  const { errors, isSubmitting } = form.formState;
  const hydrated = useHydrated();
  const onSubmit = form.handleSubmit(async (values) => {
    setStatus(null);
    try {
      await fetchJson("/api/auth/password", { body: values });
      form.reset({ currentPassword: "", newPassword: "" });
      setStatus({ tone: "success", text: "Your password is changed. Use the new one next time you sign in." });
    } catch (error) {
      const message = applyServerErrors(error, form.setError, ["currentPassword", "newPassword"]);
      if (message) setStatus({ tone: "error", text: message });
    }
  });
  return (
    <form method="post" onSubmit={onSubmit} noValidate className="space-y-4">
      <TextField label="Current password" type="password" autoComplete="current-password" error={errors.currentPassword?.message} {...form.register("currentPassword")} />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters, and not the one you use now.`}
        error={errors.newPassword?.message}
        {...form.register("newPassword")}
      />
      <div aria-live="polite">{status ? <FormAlert tone={status.tone}>{status.text}</FormAlert> : null}</div>
      <button type="submit" className="btn-primary" disabled={!hydrated || isSubmitting}>
        {isSubmitting ? "Changing…" : "Change password"}
      </button>
    </form>
  );
}
