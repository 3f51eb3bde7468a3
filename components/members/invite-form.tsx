"use client";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { invitationCreateSchema, type InvitationCreateInput } from "@/lib/validation/members";
import { ROLES, type Role } from "@/lib/permissions";
import { fetchJson } from "@/components/providers";
import { applyServerErrors, FormAlert, SelectField, TextField, useHydrated } from "@/components/auth/form-parts";

export interface InvitationsPanelProps {
  workspaceId: string;
}

interface Invitation {
  id: string;
  email: string;
  role: Role;
  expiresAt: string;
  expired: boolean;
}

const invitationsKey = (workspaceId: string) => ["workspaces", workspaceId, "invitations"] as const;
const dateFormat = new Intl.DateTimeFormat("en", { month: "short", day: "numeric", hour: "2-digit", minute: "2-digit" });
const roleOptions = ROLES.map((r) => ({ value: r, label: r[0]?.toUpperCase() + r.slice(1) }));

/** The owner's invite form and the invitations still waiting for an answer. */
export function InvitationsPanel({ workspaceId }: InvitationsPanelProps) {
  const queryClient = useQueryClient();
  const [formError, setFormError] = useState<string | null>(null);
  const [sent, setSent] = useState<{ email: string; mailStatus: string } | null>(null);
  const form = useForm<InvitationCreateInput>({
    resolver: zodResolver(invitationCreateSchema),
    defaultValues: { email: "", role: "engineer" },
    mode: "onTouched",
  });
  const { errors, isSubmitting } = form.formState;
  const hydrated = useHydrated();

  const invitations = useQuery({
    queryKey: invitationsKey(workspaceId),
    queryFn: () => fetchJson<{ invitations: Invitation[] }>(`/api/workspaces/${workspaceId}/invitations`).then((r) => r.invitations),
  });

  const revoke = useMutation({
    mutationFn: (id: string) => fetchJson(`/api/workspaces/${workspaceId}/invitations/${id}`, { method: "DELETE" }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["workspaces", workspaceId] }),
  });

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    setSent(null);
    try {
      const res = await fetchJson<{ mail: { status: string } }>(`/api/workspaces/${workspaceId}/invitations`, { body: values });
      setSent({ email: values.email.trim().toLowerCase(), mailStatus: res.mail.status });
      form.reset({ email: "", role: values.role });
      await queryClient.invalidateQueries({ queryKey: ["workspaces", workspaceId] });
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["email", "role"]));
    }
  });

  return (
    <section aria-labelledby="invite-heading" className="panel space-y-5">
      <div>
        <h2 id="invite-heading" className="text-base font-semibold">
          Invite a colleague
        </h2>
        <p className="mt-1 text-sm text-ink-500">They get an e-mail with a link that works once, for 7 days.</p>
      </div>
      <form method="post" onSubmit={onSubmit} noValidate className="grid gap-4 sm:grid-cols-[1fr_11rem_auto] sm:items-start">
        <TextField label="E-mail" type="email" autoComplete="off" error={errors.email?.message} {...form.register("email")} />
        <SelectField label="Role" options={roleOptions} error={errors.role?.message} {...form.register("role")} />
        <button type="submit" className="btn-primary sm:mt-6" disabled={!hydrated || isSubmitting}>
          {isSubmitting ? "Sending…" : "Send invitation"}
        </button>
      </form>
      <div aria-live="polite" className="space-y-2">
        {formError ? <FormAlert>{formError}</FormAlert> : null}
        {sent ? (
          sent.mailStatus === "sent" ? (
            <FormAlert tone="success">Invitation sent to {sent.email}.</FormAlert>
          ) : (
            <FormAlert tone="info">
              The invitation to {sent.email} is saved, but the mail server did not take the message. It waits in the outbox and can be sent
              again from Mail.
            </FormAlert>
          )
        ) : null}
      </div>

      <div>
        <h3 className="text-sm font-semibold text-ink-700">Waiting for an answer</h3>
        {invitations.isPending ? (
          <p className="mt-2 text-sm text-ink-500">Loading…</p>
        ) : invitations.isError ? (
          <FormAlert>{invitations.error.message}</FormAlert>
        ) : invitations.data.length === 0 ? (
          <p className="mt-2 text-sm text-ink-500">No open invitations.</p>
        ) : (
          <ul className="mt-2 divide-y divide-stone-100 rounded-md border border-stone-200">
            {invitations.data.map((inv) => (
              <li key={inv.id} className="flex flex-wrap items-center gap-3 px-3 py-2 text-sm">
                <span className="font-medium text-ink-900">{inv.email}</span>
                <span className="capitalize text-ink-500">{inv.role}</span>
                <span className={`text-xs ${inv.expired ? "text-strained-600" : "text-ink-500"}`}>
                  {inv.expired ? "expired" : `expires ${dateFormat.format(new Date(inv.expiresAt))}`}
                </span>
                <button
                  type="button"
                  className="btn-quiet ml-auto"
                  onClick={() => revoke.mutate(inv.id)}
                  disabled={revoke.isPending}
                  aria-label={`Withdraw the invitation to ${inv.email}`}
                >
                  Withdraw
                </button>
              </li>
            ))}
          </ul>
        )}
      </div>
    </section>
  );
}
