"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { workspaceCreateSchema } from "@/lib/validation/members";
import { fetchJson } from "@/components/providers";
import { applyServerErrors, FormAlert, TextField, useHydrated } from "@/components/auth/form-parts";

export function CreateWorkspaceForm() {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm({ resolver: zodResolver(workspaceCreateSchema), defaultValues: { name: "" }, mode: "onTouched" });
  const { errors, isSubmitting } = form.formState;
  const hydrated = useHydrated();
  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      const { workspace } = await fetchJson<{ workspace: { id: string } }>("/api/workspaces", { body: values });
      router.push(`/w/${workspace.id}`);
      router.refresh();
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["name"]));
    }
  });
  return (
    <form method="post" onSubmit={onSubmit} noValidate className="space-y-4">
      {formError ? <FormAlert>{formError}</FormAlert> : null}
      <TextField label="Workspace name" placeholder="e.g. your firm's name" autoFocus error={errors.name?.message} {...form.register("name")} />
      <button type="submit" className="btn-primary" disabled={!hydrated || isSubmitting}>
        {isSubmitting ? "Creating…" : "Create workspace"}
      </button>
    </form>
  );
}
