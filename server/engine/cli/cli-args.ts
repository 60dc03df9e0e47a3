/**
 * Command-line options: `--name value` pairs and bare flags, checked against the
 * options each command accepts so a typo is reported instead of ignored.
 */
export class CliInputError extends Error {
  override readonly name = 'CliInputError';
}

export interface ParsedArgs {
  readonly command: string;
  readonly options: ReadonlyMap<string, string>;
  readonly flags: ReadonlySet<string>;
}

const COMMON = [
  'prices',
  'battery',
  'load',
  'generation',
  'export-prices',
  'site',
  'price-unit',
  'load-unit',
  'generation-unit',
  'method',
];
const COMMON_FLAGS = ['interval-ending', 'fill-gaps'];
/** Operating limits (DESIGN section 3.3): reserves, availability and the power before the start. */
const LIMITS = ['reserve-up-prices', 'reserve-down-prices', 'reserve-hours', 'availability', 'initial-power'];

export const COMMAND_OPTIONS: Readonly<Record<string, readonly string[]>> = {
  steady: [...COMMON, 'days'],
  reference: [...COMMON, ...LIMITS, 'start', 'end', 'terminal', 'initial-soc', 'days'],
  plan: [...COMMON, ...LIMITS, 'start', 'end', 'horizon', 'terminal', 'initial-soc', 'band', 'days'],
  study: [
    ...COMMON,
    ...LIMITS.filter((name) => name !== 'initial-power'),
    'start',
    'end',
    'horizons',
    'replan',
    'terminal',
    'initial-soc',
    'gap-target',
    'band',
    'workers',
    'days',
  ],
};

export const USAGE = `usage: npm run --silent cli -- <command> [options]
commands:
  steady    --prices F --battery F [--load F] [--site F] [--days all|weekday|weekend]
  reference --prices F --battery F [--load F] [--site F] [--start ISO] [--end ISO] [--terminal free|cyclic|steady-value|target:PCT] [--initial-soc PCT] [--days all|weekday|weekend]
  plan      --prices F --battery F [--load F] [--site F] --start ISO --end ISO --horizon HOURS --terminal RULE [--initial-soc PCT] [--days all|weekday|weekend]
  study     --prices F --battery F [--load F] [--site F] [--start ISO] [--end ISO] --horizons 6,12,24,48 --replan HOURS --terminal free,steady-value [--days all|weekday|weekend]
common: [--generation F] [--export-prices F] [--price-unit currency/MWh|currency/kWh|<site currency>/MWh|…/kWh] [--load-unit kW|MW|kWh|MWh]
        [--generation-unit ...] [--interval-ending] [--fill-gaps] [--method auto|lp|dp]
limits (reference, plan, study): [--reserve-up-prices F] [--reserve-down-prices F] [--reserve-hours HOURS]
        [--availability F] [--initial-power KW (reference, plan: net power before the start, discharge positive)]
        reserve prices: columns timestamp,price in currency/MW/h; availability: timestamp,availability as 0–1;
        battery file keys rampKwPerMin (kW/min) and switchingCostPerMw (per MW), null = none`;

export function parseArgs(argv: readonly string[]): ParsedArgs {
  const [command, ...rest] = argv;
  if (!command || !(command in COMMAND_OPTIONS)) {
    throw new CliInputError(command ? `unknown command "${command}"\n${USAGE}` : USAGE);
  }
  const allowed = COMMAND_OPTIONS[command]!;
  const options = new Map<string, string>();
  const flags = new Set<string>();
  for (let i = 0; i < rest.length; i++) {
    const arg = rest[i]!;
    if (!arg.startsWith('--')) throw new CliInputError(`unexpected argument "${arg}": options start with --\n${USAGE}`);
    const [name, inline] = arg.slice(2).split(/=(.*)/s, 2) as [string, string | undefined];
    if (COMMON_FLAGS.includes(name)) {
      flags.add(name);
      continue;
    }
    if (!allowed.includes(name)) throw new CliInputError(`the ${command} command has no option --${name}\n${USAGE}`);
    const value = inline ?? rest[++i];
    if (value === undefined || (inline === undefined && value.startsWith('--')))
      throw new CliInputError(`--${name} needs a value`);
    if (options.has(name)) throw new CliInputError(`--${name} is given twice`);
    options.set(name, value);
  }
  return { command, options, flags };
}

export function required(args: ParsedArgs, name: string): string {
  const value = args.options.get(name);
  if (value === undefined) throw new CliInputError(`the ${args.command} command needs --${name}\n${USAGE}`);
  return value;
}

export function numberOption(args: ParsedArgs, name: string, rule: (v: number) => boolean, expect: string): number | undefined {
  const text = args.options.get(name);
  if (text === undefined) return undefined;
  const value = Number(text);
  if (text.trim() === '' || !Number.isFinite(value) || !rule(value))
    throw new CliInputError(`--${name} ${text}: expected ${expect}`);
  return value;
}

export function listOption(args: ParsedArgs, name: string): string[] {
  return required(args, name)
    .split(',')
    .map((s) => s.trim())
    .filter((s) => s !== '');
}
