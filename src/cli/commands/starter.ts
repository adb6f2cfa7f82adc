/**
 * `hotjunction starter --topology divider|ladder|adc`: writes a starter design file for a topology, every section
 * filled with an invented example value and a note per section.
 * @module
 */
import { Option, type Command } from "commander";
import { starterDesign, starterTopologies, type StarterTopology } from "../../design/starterDesigns.js";
import { _emitOutputs, _planCommandOutputs } from "../outputOptions.js";
import type { CommandContext } from "../commandContext.js";

/** Registers the `starter` command. @internal */
export function registerStarterCommand(program: Command, context: CommandContext): Command {
  return program
    .command("starter")
    .description("write a starter design file for a topology (invented example values and a note per section)")
    .addOption(new Option("--topology <kind>", "comparator with one divider per setpoint, one resistor ladder, or an ADC with firmware trip").choices([...starterTopologies]).makeOptionMandatory())
    .option("--out <file>", "write it to FILE (atomically) instead of standard output")
    .option("--force", "allow --out to replace an existing file")
    .addHelpText("after", "\nExample:\n  hotjunction starter --topology ladder --out lehr.json && hotjunction validate lehr.json && hotjunction check lehr.json\n")
    .action(async (options: { topology: StarterTopology; out?: string; force?: boolean }) => {
      const plan = _planCommandOutputs(context.io, options, []);
      _emitOutputs(context.io, plan, options, `${JSON.stringify(starterDesign(options.topology), null, 2)}\n`);
    });
}
