/**
 * The command line's operating-limit inputs (DESIGN section 3.3): reserve price
 * files (`timestamp,price`, currency/MW/h), the availability file
 * (`timestamp,availability`, a fraction 0–1) and the reserve delivery duration.
 * Reserve prices and the duration only make sense together, so either alone is
 * refused with what is missing.
 */
import type { AnyProfileKind } from '@shared/profile-csv';
import type { DispatchInputs, ProfileSeries } from '../inputs/align-inputs';
import { CliInputError, numberOption, type ParsedArgs } from './cli-args';

type Read = (name: string, kind: AnyProfileKind, unit: string) => ProfileSeries | undefined;

type LimitInputs = Pick<DispatchInputs, 'availability' | 'reserveUpPrices' | 'reserveDownPrices' | 'reserveHours'>;

export function readLimitInputs(args: ParsedArgs, read: Read): LimitInputs {
  const up = read('reserve-up-prices', 'reserve-up-price', 'currency/MW/h');
  const down = read('reserve-down-prices', 'reserve-down-price', 'currency/MW/h');
  const availability = read('availability', 'availability', 'fraction');
  const hours = numberOption(args, 'reserve-hours', (v) => v > 0, 'a delivery duration in hours above 0, e.g. 1');
  if ((up || down) && hours === undefined) {
    throw new CliInputError(
      '--reserve-up-prices and --reserve-down-prices need --reserve-hours D, the delivery duration the held reserve must be able to sustain (hours)',
    );
  }
  if (hours !== undefined && !up && !down) {
    throw new CliInputError(
      '--reserve-hours needs --reserve-up-prices or --reserve-down-prices (the reserve availability prices)',
    );
  }
  return {
    ...(up ? { reserveUpPrices: up } : {}),
    ...(down ? { reserveDownPrices: down } : {}),
    ...(availability ? { availability } : {}),
    ...(hours !== undefined ? { reserveHours: hours } : {}),
  };
}

/** --initial-power: the net power before the start, kW (discharge positive), or undefined. */
export function initialPower(args: ParsedArgs): number | undefined {
  return numberOption(args, 'initial-power', Number.isFinite, 'a net power in kW (discharge positive, charge negative)');
}
