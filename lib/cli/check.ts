/** `check FILE|-`: member check over load cases (cli-contract.md § check). */
import { checkMember } from "../../engine/check-member";
import type { CheckInput } from "../../engine/types";
import { convertCheckInput, convertCheckOutput } from "../../engine/units";
import { checkRequestSchema } from "../validation/check-request";
import { EXIT_FAIL, EXIT_OK, parseOrThrow, readJsonArgument, writeJson, type CliCommand } from "./run-command";

/**
 * Validate, convert SI to engine units when asked, check, convert back.
 * @returns the check output in the request's units
 */
export function runCheckRequest(value: unknown): ReturnType<typeof checkMember> {
  const req = parseOrThrow(checkRequestSchema, value, "invalid check request");
  const si = req.units === "SI";
  const { units: _units, ...rest } = req;
  const input: CheckInput = rest;
  const us = si ? convertCheckInput(input, "US") : input;
  const options = { ...(us.options ?? {}), displayUnits: si ? ("SI" as const) : ("US" as const) };
  const out = checkMember({ ...us, options });
  return si ? convertCheckOutput(out, "SI") : out;
}

export const command: CliCommand = {
  name: "check",
  usage: "check FILE|-      member check over load cases",
  async run(args, io) {
    const out = runCheckRequest(await readJsonArgument(args, io));
    writeJson(io, out);
    return out.pass ? EXIT_OK : EXIT_FAIL;
  },
};
