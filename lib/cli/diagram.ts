/** `diagram FILE|-`: interaction diagram of a section (cli-contract.md § diagram). */
import { interactionDiagram } from "../../engine/interaction";
import { resolveSection } from "../../engine/section";
import { convertDiagram, convertSectionInput } from "../../engine/units";
import { diagramRequestSchema } from "../validation/diagram-request";
import { EXIT_OK, parseOrThrow, readJsonArgument, writeJson, type CliCommand } from "./run-command";

export const command: CliCommand = {
  name: "diagram",
  usage: "diagram FILE|-    interaction diagram of a section",
  async run(args, io) {
    const req = parseOrThrow(diagramRequestSchema, await readJsonArgument(args, io), "invalid diagram request");
    const si = req.units === "SI";
    const section = resolveSection(si ? convertSectionInput(req.section, "US") : req.section);
    const d = interactionDiagram(section, req.axis, req.points, req.sense ?? 1);
    writeJson(io, si ? convertDiagram(d, "SI") : d);
    return EXIT_OK;
  },
};
