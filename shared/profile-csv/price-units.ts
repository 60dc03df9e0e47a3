/**
 * Price units in the site's own currency: on a EUR site a price profile may be
 * uploaded as `EUR/MWh` or `EUR/kWh` (`€/MWh`, `€/kWh` too) beside the generic
 * `currency/MWh` and `currency/kWh`, and means the same. A price in another
 * currency is refused: Slackwater converts no currencies, so the planner
 * converts first or uploads to a site that uses that currency. Load and
 * generation units are unchanged. Plain code, browser-safe.
 */
import { isAcceptedUnit, unitsFor, type AnyProfileKind, type PriceUnit, type ProfileUnit } from './profile-units';

export type UnitResolution =
  | { ok: true; unit: ProfileUnit; /** The currency the upload named, when it named one. */ currency: string | null }
  | { ok: false; message: string };

/** "EUR/MWh", "eur / kwh", "€/MWh": a currency code (or the euro sign) per MWh or kWh. */
const NAMED_PRICE_UNIT = /^\s*([A-Za-z]{3}|€)\s*\/\s*(mwh|kwh)\s*$/i;

/** Every unit a profile of this kind takes at a site with this currency (ISO 4217; absent = not known). */
export function acceptedUnitsFor(kind: AnyProfileKind, siteCurrency?: string | null): string[] {
  const generic = [...unitsFor(kind)];
  return kind === 'price' && siteCurrency ? [`${siteCurrency}/MWh`, `${siteCurrency}/kWh`, ...generic] : generic;
}

function listWords(units: readonly string[]): string {
  return units.join(', ');
}

/**
 * The canonical unit of an upload's unit at a site: a generic unit as it is,
 * the site's currency per MWh or kWh as `currency/MWh` or `currency/kWh`, and a
 * clear refusal (what, why, how to fix) for anything else.
 */
export function resolveProfileUnit(kind: AnyProfileKind, unit: string, siteCurrency?: string | null): UnitResolution {
  if (isAcceptedUnit(kind, unit)) return { ok: true, unit, currency: null };
  const named = NAMED_PRICE_UNIT.exec(unit);
  const accepted = listWords(acceptedUnitsFor(kind, siteCurrency));
  if (!named) return { ok: false, message: `The unit "${unit}" does not fit a ${kind} profile; choose one of ${accepted}.` };
  const code = named[1] === '€' ? 'EUR' : named[1]!.toUpperCase();
  const per = named[2]!.toLowerCase() === 'mwh' ? 'MWh' : 'kWh';
  if (kind !== 'price') {
    return {
      ok: false,
      message: `The unit "${unit}" is a price, not a ${kind}; a ${kind} profile takes one of ${accepted}.`,
    };
  }
  if (!siteCurrency) {
    return {
      ok: false,
      message: `The unit "${unit}" names a currency, but the site's currency is not known here; choose currency/${per} (prices in the site's currency).`,
    };
  }
  if (code !== siteCurrency.toUpperCase()) {
    return {
      ok: false,
      message: `The prices are in ${code}/${per}, but this site's money is in ${siteCurrency}, and Slackwater does not convert currencies. Convert the prices to ${siteCurrency} first (then choose ${siteCurrency}/${per}), or upload them to a site that uses ${code}.`,
    };
  }
  const canonical: PriceUnit = per === 'MWh' ? 'currency/MWh' : 'currency/kWh';
  return { ok: true, unit: canonical, currency: code };
}
