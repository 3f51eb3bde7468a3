import { NextResponse } from "next/server";
import { getPool } from "@/db/client";
import { probeDatabase } from "@/lib/health";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** Public liveness probe: no data, so no session needed. */
export async function GET() {
  const db = await probeDatabase(getPool());
  return NextResponse.json({ ok: db === "up", db }, { status: db === "up" ? 200 : 503 });
}
