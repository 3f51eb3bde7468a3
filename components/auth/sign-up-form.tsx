"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { signIn } from "next-auth/react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { signUpSchema } from "@/lib/validation/auth";
import { PASSWORD_MIN_LENGTH } from "@/lib/auth/password-policy";
import { fetchJson } from "@/components/providers";
import { applyServerErrors, FormAlert, TextField, useHydrated } from "./form-parts";

export interface SignUpFormProps {
  callbackUrl: string;
}

export function SignUpForm({ callbackUrl }: SignUpFormProps) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm({ resolver: zodResolver(signUpSchema), defaultValues: { name: "", email: "", password: "" }, mode: "onTouched" });
  const { errors, isSubmitting } = form.formState;
  const hydrated = useHydrated();

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await fetchJson("/api/auth/sign-up", { body: values });
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["name", "email", "password"]));
      return;
    }
    const result = await signIn("password", { email: values.email, password: values.password, redirect: false, callbackUrl });
    if (!result || result.error) {
      router.push(`/sign-in?email=${encodeURIComponent(values.email)}`);
      return;
    }
    router.replace(callbackUrl);
    router.refresh();
  });

  return (
    <form method="post" onSubmit={onSubmit} noValidate className="panel space-y-4">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      <TextField label="Your name" autoComplete="name" autoFocus error={errors.name?.message} {...form.register("name")} />
      <TextField label="Work e-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters; a short phrase of unrelated words works well.`}
        error={errors.password?.message}
        {...form.register("password")}
      />
      <button type="submit" className="btn-primary w-full justify-center" disabled={!hydrated || isSubmitting}>
        {isSubmitting ? "Creating your account…" : "Create account"}
      </button>
    </form>
  );
}
