import { NextResponse } from "next/server";
import { handler } from "@/lib/api/handler";
import { signUpSchema } from "@/lib/validation/auth";
import { createUser, publicUser } from "@/db/queries/users";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** Creates an account; the browser then signs in with the same e-mail and password. */
export const POST = handler({ body: signUpSchema }, async ({ body }) => {
  const user = await createUser({ email: body.email, name: body.name, password: body.password });
  return NextResponse.json({ user: publicUser(user) }, { status: 201 });
});
