/**
 * Reads a command's inputs: battery and site JSON, CSV profiles through the shared
 * profile reader (the same upload rules), aligned on one grid. Every problem
 * becomes a CliInputError that names the file and line.
 */
import { readFileSync } from 'node:fs';
import { decodeProfileBytes, parseProfileCsv, createZoneClock, type AnyProfileKind } from '@shared/profile-csv';
import { alignInputs, type AlignedInputs, type ProfileSeries } from '../inputs/align-inputs';
import { CliInputError, type ParsedArgs } from './cli-args';
import { readBattery, readSite } from './read-params';
import { readLimitInputs } from './read-limit-inputs';

type Kind = AnyProfileKind;

interface ProfileSite {
  readonly timezone: string;
  readonly currency?: string;
}

function readProfile(path: string, kind: Kind, unit: string, site: ProfileSite, args: ParsedArgs): ProfileSeries {
  let bytes: Uint8Array;
  try {
    bytes = readFileSync(path);
  } catch (error) {
    throw new CliInputError(`cannot read the ${kind} file ${path}: ${(error as NodeJS.ErrnoException).code ?? String(error)}`);
  }
  const parsed = parseProfileCsv(decodeProfileBytes(bytes), {
    kind,
    unit,
    timezone: site.timezone,
    ...(site.currency ? { currency: site.currency } : {}),
    intervalEnding: args.flags.has('interval-ending'),
    fillGaps: args.flags.has('fill-gaps'),
  });
  if (!parsed.ok) {
    const lines = parsed.issues.map((issue) =>
      issue.line > 0 ? `  ${path}:${issue.line}: ${issue.message}` : `  ${path}: ${issue.message}`,
    );
    throw new CliInputError(`the ${kind} profile ${path} was rejected:\n${lines.join('\n')}\n${parsed.hint}`);
  }
  for (const note of parsed.profile.notes) process.stderr.write(`note: ${path}: ${note}\n`);
  return { startMs: parsed.profile.startMs, stepMinutes: parsed.profile.stepMinutes, values: parsed.profile.values };
}

export function readInputs(args: ParsedArgs, warn: (message: string) => void): AlignedInputs {
  const pricesPath = args.options.get('prices');
  const batteryPath = args.options.get('battery');
  if (!pricesPath || !batteryPath) throw new CliInputError(`the ${args.command} command needs --prices and --battery`);
  const battery = readBattery(batteryPath, warn);
  const site = readSite(args.options.get('site'), warn);
  const priceUnit = args.options.get('price-unit') ?? 'currency/MWh';
  const read = (name: string, kind: Kind, unit: string) => {
    const path = args.options.get(name);
    return path === undefined ? undefined : readProfile(path, kind, unit, site, args);
  };
  const prices = readProfile(pricesPath, 'price', priceUnit, site, args);
  const exportPrices = read('export-prices', 'price', priceUnit);
  const load = read('load', 'load', args.options.get('load-unit') ?? 'kW');
  const generation = read('generation', 'generation', args.options.get('generation-unit') ?? 'kW');
  const aligned = alignInputs({
    battery,
    site,
    prices,
    ...(exportPrices ? { exportPrices } : {}),
    ...(load ? { load } : {}),
    ...(generation ? { generation } : {}),
    ...readLimitInputs(args, read),
  });
  if (!aligned.ok) throw new CliInputError(`${aligned.issue.field}: ${aligned.issue.message}`);
  for (const note of aligned.inputs.notes) warn(note);
  return aligned.inputs;
}

/** An instant from ISO 8601 with an offset, or a local time in the site's zone. */
export function parseInstant(text: string, timezone: string, what: string): number {
  const hasZone = /(Z|[+-]\d\d:?\d\d)$/i.test(text.trim());
  if (hasZone) {
    const ms = Date.parse(text);
    if (Number.isFinite(ms)) return ms;
  } else {
    const wall = Date.parse(`${text.trim()}Z`);
    const clock = createZoneClock(timezone);
    if (Number.isFinite(wall) && clock) {
      const instants = clock.instantsOf(wall);
      if (instants.length === 1) return instants[0]!;
      if (instants.length === 0)
        throw new CliInputError(`${what} ${text} does not exist in ${timezone} (a daylight-saving change skips it)`);
      throw new CliInputError(`${what} ${text} happens twice in ${timezone} (daylight-saving change): add the UTC offset`);
    }
  }
  throw new CliInputError(`${what} "${text}" is not an ISO 8601 time such as 2026-05-05T00:00:00+02:00`);
}
