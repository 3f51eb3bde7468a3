import { handler } from "@/lib/api/handler";
import { requireUser } from "@/lib/authz";
import { command } from "@/lib/cli/diagram";
import { respondWithCliCommand } from "../check/run-cli-command";

/** Interaction diagram of a section (cli-contract.md § diagram), exactly as the CLI's `diagram` prints it. */
export const POST = handler({}, async ({ user, req }) => {
  requireUser(user);
  return respondWithCliCommand(command, await req.text());
});
