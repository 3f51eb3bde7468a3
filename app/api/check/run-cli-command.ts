/**
 * Runs a CLI command (lib/cli) on a request body in memory, so an API route answers exactly what
 * `npm run cli -- <command> -` prints for the same JSON: stdout on exit 0/1, the contract's
 * error body with 400 on exit 2.
 */
import { NextResponse } from "next/server";
import { runCommand, EXIT_FAIL, EXIT_INVALID, EXIT_OK, type CliCommand } from "@/lib/cli/run-command";

export async function respondWithCliCommand(command: CliCommand, bodyText: string): Promise<NextResponse> {
  let stdout = "";
  let stderr = "";
  const code = await runCommand(command, ["-"], {
    stdout: (t) => void (stdout += t),
    stderr: (t) => void (stderr += t),
    readInput: async () => bodyText,
  });
  if (code === EXIT_OK || code === EXIT_FAIL) {
    return new NextResponse(stdout, {
      status: 200,
      headers: { "content-type": "application/json; charset=utf-8", "x-caryatid-exit-code": String(code) },
    });
  }
  const status = code === EXIT_INVALID ? 400 : 500;
  return new NextResponse(stderr || JSON.stringify({ error: "internal error", issues: [] }), {
    status,
    headers: { "content-type": "application/json; charset=utf-8", "x-caryatid-exit-code": String(code) },
  });
}
