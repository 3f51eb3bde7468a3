/** Schemas for workspaces, invitations and memberships, shared by the forms and the route handlers. */
import { z } from "zod";
import { ROLES } from "@/lib/permissions";
import { emailSchema, newPasswordSchema, personNameSchema, plainNameSchema } from "./auth";
import { describePasswordWeakness } from "@/lib/auth/password-policy";

export const roleSchema = z.enum(ROLES, { error: `choose one of: ${ROLES.join(", ")}` });

export const workspaceCreateSchema = z.object({ name: plainNameSchema("the workspace name") });
export type WorkspaceCreateInput = z.input<typeof workspaceCreateSchema>;

export const invitationCreateSchema = z.object({ email: emailSchema, role: roleSchema });
export type InvitationCreateInput = z.input<typeof invitationCreateSchema>;

export const roleChangeSchema = z.object({
  role: roleSchema,
  /** the membership version the client read; a stale one is refused with 409 */
  version: z.number().int().positive().optional(),
});
export type RoleChangeInput = z.input<typeof roleChangeSchema>;

export const invitationTokenSchema = z.string().min(20, "this invitation link is incomplete").max(200, "this invitation link is not valid");

/** Accepting while signed in needs only the token; a newcomer also chooses a name and password. */
export const invitationAcceptSchema = z
  .object({
    token: invitationTokenSchema,
    name: personNameSchema.optional(),
    password: newPasswordSchema.optional(),
  })
  .superRefine((v, ctx) => {
    if ((v.name === undefined) !== (v.password === undefined)) {
      ctx.addIssue({ code: "custom", path: [v.name === undefined ? "name" : "password"], message: "a new account needs both a name and a password" });
    }
    if (v.password !== undefined) {
      const weakness = describePasswordWeakness(v.password, { name: v.name });
      if (weakness) ctx.addIssue({ code: "custom", path: ["password"], message: weakness });
    }
  });
export type InvitationAcceptInput = z.input<typeof invitationAcceptSchema>;

/** The newcomer part of the acceptance form (the token travels separately). */
export const newcomerSchema = z
  .object({ name: personNameSchema, password: newPasswordSchema })
  .superRefine((v, ctx) => {
    const weakness = describePasswordWeakness(v.password, { name: v.name });
    if (weakness) ctx.addIssue({ code: "custom", path: ["password"], message: weakness });
  });
export type NewcomerInput = z.input<typeof newcomerSchema>;
