/**
 * Price units in the site's currency: on a EUR site `EUR/MWh` and `EUR/kWh`
 * mean the same as the generic `currency/MWh` and `currency/kWh`; a price in
 * another currency is refused with what, why and how to fix it.
 */
import { describe, expect, it } from 'vitest';
import { acceptedUnitsFor, resolveProfileUnit } from '../../shared/profile-csv/price-units';
import { profileUploadOptionsSchema, profileUploadOptionsSchemaFor } from '../../shared/schemas/profile-upload';
import { accepted, csv, rejected } from './support';

const file = csv('time,price', '2026-01-01T00:00:00+01:00,0.1025', '2026-01-01T01:00:00+01:00,0.0981');

describe('price units in the site currency', () => {
  it('reads EUR/MWh and EUR/kWh on a EUR site as the generic units', () => {
    expect(resolveProfileUnit('price', 'EUR/MWh', 'EUR')).toEqual({ ok: true, unit: 'currency/MWh', currency: 'EUR' });
    expect(resolveProfileUnit('price', 'EUR/kWh', 'EUR')).toEqual({ ok: true, unit: 'currency/kWh', currency: 'EUR' });
    // Spacing, letter case and the euro sign are read the same way.
    expect(resolveProfileUnit('price', ' eur / kwh ', 'EUR')).toMatchObject({ ok: true, unit: 'currency/kWh' });
    expect(resolveProfileUnit('price', '€/MWh', 'EUR')).toMatchObject({ ok: true, unit: 'currency/MWh' });
    // The generic units stay, with or without a site currency.
    expect(resolveProfileUnit('price', 'currency/MWh', 'EUR')).toEqual({ ok: true, unit: 'currency/MWh', currency: null });
    expect(resolveProfileUnit('price', 'currency/kWh')).toMatchObject({ ok: true, unit: 'currency/kWh' });
    expect(acceptedUnitsFor('price', 'EUR')).toEqual(['EUR/MWh', 'EUR/kWh', 'currency/MWh', 'currency/kWh']);
    expect(acceptedUnitsFor('load', 'EUR')).toEqual(['kW', 'MW', 'kWh', 'MWh']);
  });

  it('converts EUR/kWh to per-MWh values like currency/kWh, and says which currency it read', () => {
    // [D] 0.1025 EUR/kWh × 1000 kWh/MWh = 102.5 EUR/MWh.
    const profile = accepted(file, { unit: 'EUR/kWh', currency: 'EUR' });
    expect(profile.values[0]).toBeCloseTo(102.5, 9);
    expect(profile.values[1]).toBeCloseTo(98.1, 9);
    expect(profile.unit).toBe('currency/MWh');
    expect(profile.notes[0]).toBe("Prices read as EUR, the site's currency, per kWh.");
    expect(accepted(file, { unit: 'currency/kWh' }).values).toEqual(profile.values);
  });

  it('refuses another currency, naming both and how to fix it', () => {
    const result = resolveProfileUnit('price', 'GBP/MWh', 'EUR');
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.message).toBe(
      "The prices are in GBP/MWh, but this site's money is in EUR, and Slackwater does not convert currencies. Convert the prices to EUR first (then choose EUR/MWh), or upload them to a site that uses GBP.",
    );
    const { issues } = rejected(file, { unit: 'USD/kWh', currency: 'EUR' });
    expect(issues).toEqual([expect.objectContaining({ line: 0, message: expect.stringContaining('prices are in USD/kWh') })]);
  });

  it('refuses a named currency where none can be checked, and a price unit on a load profile', () => {
    expect(resolveProfileUnit('price', 'EUR/MWh')).toMatchObject({
      ok: false,
      message: expect.stringContaining("the site's currency is not known here; choose currency/MWh"),
    });
    expect(rejected(file, { unit: 'EUR/MWh' }).issues[0]!.message).toContain('names a currency');
    expect(resolveProfileUnit('load', 'EUR/MWh', 'EUR')).toMatchObject({
      ok: false,
      message: 'The unit "EUR/MWh" is a price, not a load; a load profile takes one of kW, MW, kWh, MWh.',
    });
    expect(resolveProfileUnit('price', 'EUR per MWh', 'EUR')).toMatchObject({
      ok: false,
      message: 'The unit "EUR per MWh" does not fit a price profile; choose one of EUR/MWh, EUR/kWh, currency/MWh, currency/kWh.',
    });
  });

  it('lets the upload options of a EUR site take EUR/MWh on the unit field, and refuse GBP/MWh there', () => {
    const euro = profileUploadOptionsSchemaFor('EUR');
    expect(euro.parse({ kind: 'price', unit: 'EUR/MWh' })).toEqual({
      kind: 'price',
      unit: 'EUR/MWh',
      intervalEnding: false,
      fillGaps: false,
    });
    const gbp = euro.safeParse({ kind: 'price', unit: 'GBP/MWh' });
    expect(gbp.success).toBe(false);
    expect(gbp.error?.issues[0]).toMatchObject({
      path: ['unit'],
      message: expect.stringContaining('does not convert currencies'),
    });
    // The schema without a site keeps to the generic units.
    expect(profileUploadOptionsSchema.safeParse({ kind: 'price', unit: 'EUR/MWh' }).success).toBe(false);
  });
});
