import { handler } from "@/lib/api/handler";
import { requireUser } from "@/lib/authz";
import { command } from "@/lib/cli/check";
import { respondWithCliCommand } from "./run-cli-command";

/**
 * Member check (cli-contract.md § check): the contract's check JSON in, the check output out —
 * byte for byte what the CLI's `check` prints. Any signed-in user may run it: it reads and
 * writes no stored data. `x-caryatid-exit-code` carries the CLI's exit code (0 pass, 1 fails).
 */
export const POST = handler({}, async ({ user, req }) => {
  requireUser(user);
  return respondWithCliCommand(command, await req.text());
});
