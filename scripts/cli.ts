/**
 * Command-line entry (cli-contract.md): `npm run --silent cli -- <command> ...`.
 * To add a command: write lib/cli/<name>.ts exporting `command: CliCommand` and add one
 * line to the table below.
 */
import { EXIT_INVALID, processIo, runCommand, type CliCommand } from "../lib/cli/run-command";

const commands: Record<string, () => Promise<{ command: CliCommand }>> = {
  check: () => import("../lib/cli/check"),
  diagram: () => import("../lib/cli/diagram"),
  k: () => import("../lib/cli/k"),
  optimize: () => import("../lib/cli/optimize"),
  standardize: () => import("../lib/cli/standardize"),
};

async function main(argv: string[]): Promise<number> {
  const [name, ...args] = argv;
  const load = name === undefined ? undefined : commands[name];
  if (load === undefined) {
    const known = Object.keys(commands).join(", ");
    processIo.stderr(
      JSON.stringify({
        error: name === undefined ? "missing command" : `unknown command ${JSON.stringify(name)}`,
        issues: [{ path: "", message: `commands: ${known}` }],
      }) + "\n",
    );
    return EXIT_INVALID;
  }
  const { command } = await load();
  return runCommand(command, args, processIo);
}

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (e: unknown) => {
    process.stderr.write(JSON.stringify({ error: "internal error", issues: [], message: String(e) }) + "\n");
    process.exitCode = 3;
  },
);
