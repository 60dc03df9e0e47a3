/**
 * Fixtures for the sign-off and export API tests: a site, a battery and a
 * price profile made through the real API, and plans inserted straight into
 * the plans table with an inputs snapshot and a results series built here
 * (the sign-off rules do not depend on how the schedule was solved).
 */
import { randomUUID } from 'node:crypto';
import type TestAgent from 'supertest/lib/agent';
import type { PlanInputs, PlanResults, PlanStep } from '@shared/schemas/plan';
import { getDb } from '../../server/db/client';
import { plans } from '../../server/plans/plans.schema';
import { createBattery, createSite, HOUR_MS, uploadSeries } from '../support/api-fixtures';

export interface Place {
  siteId: string;
  siteName: string;
  timezone: string;
  batteryId: string;
  profileId: string;
  /** The uploaded hourly prices, currency/MWh, from `pricesStartMs`. */
  prices: number[];
  pricesStartMs: number;
}

/** Invented hourly prices with a daily shape and some negative hours: 48 values from 2026-03-29 00:00 Berlin (+01:00). */
export function inventedPrices(): number[] {
  return Array.from({ length: 48 }, (_, h) => {
    const hour = h % 24;
    const base = 60 + 35 * Math.sin(((hour - 9) / 24) * 2 * Math.PI);
    return Math.round((hour >= 12 && hour <= 14 ? base - 100 : base) * 100) / 100;
  });
}

/** A site (name with a formula start, to exercise the export guard), a 1 MW / 2 MWh battery and a price profile. */
export async function createPlace(planner: TestAgent, siteName = `=Harbour ${randomUUID().slice(0, 8)}`): Promise<Place> {
  const site = await createSite(planner, { name: siteName });
  const batteryId = await createBattery(planner, site.id);
  const prices = inventedPrices();
  const pricesStartMs = Date.parse('2026-03-29T00:00:00+01:00');
  const profileId = await uploadSeries(
    planner,
    site.id,
    'price',
    { values: prices, startMs: pricesStartMs, stepMinutes: 60 },
    'Invented prices',
  );
  return { siteId: site.id, siteName, timezone: 'Europe/Berlin', batteryId, profileId, prices, pricesStartMs };
}

/**
 * A schedule over the window plus a 6-hour lookahead: charge at full power in the
 * two cheapest delivery hours, discharge in the two dearest (not optimal, only plausible).
 */
function results(prices: number[], deliverySteps: number): PlanResults {
  const ranked = prices
    .slice(0, deliverySteps)
    .map((p, i) => ({ p, i }))
    .sort((a, b) => a.p - b.p);
  const cheap = new Set(ranked.slice(0, 2).map((r) => r.i));
  const dear = new Set(ranked.slice(-2).map((r) => r.i));
  let soc = 1000;
  const steps: PlanStep[] = prices.map((p, i) => {
    const chargeKw = cheap.has(i) ? 900 : 0;
    const dischargeKw = dear.has(i) ? 800 : 0;
    soc = soc + chargeKw * 0.92 - dischargeKw / 0.92;
    return {
      time: '',
      delivery: i < deliverySteps,
      priceImport: p,
      priceExport: p,
      chargeKw,
      dischargeKw,
      gridImportKw: chargeKw,
      gridExportKw: dischargeKw,
      socKwh: soc,
      socPct: (soc / 2000) * 100,
      storedEnergyValue: i === 5 ? null : 55 + i / 8,
      steadySocKwh: null,
      steadyValue: null,
      distance: null,
      arc: 'near',
    };
  });
  // Cast: the sign-off and export read only stepMinutes, deliverySteps and the steps;
  // the rest of the plans module's result shape is filled loosely so this fixture
  // does not break whenever that module adds a figure.
  return {
    method: 'dp',
    stepMinutes: 60,
    deliverySteps,
    steps,
    summary: {
      cost: -120.5,
      earnings: 120.5,
      equivalentCycles: 1,
      peakImportKw: 900,
      chargedKwh: 1800,
      dischargedKwh: 1600,
      endSocPct: 50,
      simultaneousSteps: 0,
    },
    turnpike: {
      bandPct: 5,
      nearSteadyShare: 0.9,
      entryArcSteps: 1,
      leavingArcSteps: 1,
      flags: [],
      summary: 'Stays near the steady cycle.',
    },
    steadyCycle: null,
    decisionHorizonHours: null,
    valueCurves: [],
    notes: [],
    solveSeconds: 0.01,
  } as unknown as PlanResults;
}

export interface PlanOptions {
  /** First delivery hour as an offset into the profile; default 0. */
  fromHour?: number;
  hours?: number;
  status?: 'draft';
  withResults?: boolean;
}

/** Inserts a draft plan for the place; its steps carry the profile's prices. */
export async function insertDraftPlan(
  place: Place,
  createdBy: string,
  o: PlanOptions = {},
): Promise<{ id: string; version: number; deliveryStart: Date; deliveryEnd: Date }> {
  const fromHour = o.fromHour ?? 0;
  const hours = o.hours ?? 24;
  const lookahead = Math.min(6, place.prices.length - fromHour - hours);
  const start = new Date(place.pricesStartMs + fromHour * HOUR_MS);
  const end = new Date(start.getTime() + hours * HOUR_MS);
  const window = place.prices.slice(fromHour, fromHour + hours + lookahead);
  const res = results(window, hours);
  res.steps.forEach((s, i) => (s.time = new Date(start.getTime() + i * HOUR_MS).toISOString()));
  // Cast for the same reason as the results: only site, battery and the window are read.
  const inputs = {
    battery: {
      id: place.batteryId,
      name: 'Unit 1',
      version: 1,
      powerChargeKw: 1000,
      powerDischargeKw: 1000,
      energyKwh: 2000,
      socMinPct: 10,
      socMaxPct: 90,
      socInitialPct: 50,
      efficiencyCharge: 0.92,
      efficiencyDischarge: 0.92,
      selfDischargePctPerHour: 0,
      degradationCostPerMwh: 0,
      maxCyclesPerDay: 1,
    },
    site: {
      id: place.siteId,
      name: place.siteName,
      timezone: place.timezone,
      currency: 'EUR',
      importLimitKw: 5000,
      exportLimitKw: 4000,
      demandChargePerKw: null,
    },
    profiles: {
      price: {
        id: place.profileId,
        name: 'Invented prices',
        kind: 'price',
        start: new Date(place.pricesStartMs).toISOString(),
        end: new Date(place.pricesStartMs + 48 * HOUR_MS).toISOString(),
        stepMinutes: 60,
        sha256: 'f'.repeat(64),
      },
      load: null,
      generation: null,
    },
    deliveryStart: start.toISOString(),
    deliveryEnd: end.toISOString(),
    horizonHours: hours + lookahead,
    terminalRule: 'free',
    initialSocPct: 50,
    initialSocSource: 'battery',
    initialSocPlanId: null,
    bandPct: 5,
    warnings: [],
  } as unknown as PlanInputs;
  const withResults = o.withResults ?? true;
  const [row] = await getDb()
    .insert(plans)
    .values({
      siteId: place.siteId,
      batteryId: place.batteryId,
      priceProfileId: place.profileId,
      deliveryStart: start,
      deliveryEnd: end,
      horizonHours: hours + lookahead,
      terminalRule: 'free',
      initialSocPct: 50,
      inputs,
      createdBy,
      ...(withResults ? { results: res, resultsInputVersion: 1, resultsAt: new Date(), method: 'dp' } : {}),
    })
    .returning();
  if (!row) throw new Error('no plan row');
  return { id: row.id, version: row.version, deliveryStart: start, deliveryEnd: end };
}
