/**
 * Engine command line: `npm run --silent cli -- steady|reference|plan|study …`.
 * stdout carries exactly one JSON document; progress and warnings go to stderr.
 * Exit codes: 0 success, 2 bad input (message on stderr), 1 an internal failure.
 */
import { CliInputError, parseArgs } from './cli-args';
import { readInputs } from './read-inputs';
import { planCommand, referenceCommand, steadyCommand, studyCommand } from './run-commands';

const warn = (message: string) => process.stderr.write(`warning: ${message}\n`);
const progress = (message: string) => process.stderr.write(`${message}\n`);

async function main(argv: readonly string[]): Promise<number> {
  try {
    const args = parseArgs(argv);
    const inputs = readInputs(args, warn);
    const output =
      args.command === 'steady'
        ? steadyCommand(inputs, args)
        : args.command === 'reference'
          ? referenceCommand(inputs, args)
          : args.command === 'plan'
            ? planCommand(inputs, args)
            : await studyCommand(inputs, args, progress);
    process.stdout.write(`${JSON.stringify(output)}\n`);
    return 0;
  } catch (error) {
    if (error instanceof CliInputError) {
      process.stderr.write(`error: ${error.message}\n`);
      return 2;
    }
    process.stderr.write(`internal error: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
    return 1;
  }
}

process.exitCode = await main(process.argv.slice(2));
