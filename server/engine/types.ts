/**
 * The engine's input and output contract. Units: kW, kWh, hours; prices in
 * currency/MWh (divide by 1000 for kWh). Everything here is plain readonly data.
 */

/** Battery parameters, the same keys as the command line's battery JSON. */
export interface BatteryParams {
  readonly powerChargeKw: number;
  readonly powerDischargeKw: number;
  readonly energyKwh: number;
  readonly socMinPct: number;
  readonly socMaxPct: number;
  readonly socInitialPct: number;
  /** Charging efficiency η_ch in (0, 1]. */
  readonly efficiencyCharge: number;
  /** Discharging efficiency η_dis in (0, 1]. */
  readonly efficiencyDischarge: number;
  /** Self-discharge σ in % of stored energy per hour. */
  readonly selfDischargePctPerHour: number;
  /** Degradation cost per MWh discharged. */
  readonly degradationCostPerMwh: number;
  /** Daily cap on equivalent full cycles (discharged energy / usable energy); null = none. */
  readonly maxCyclesPerDay: number | null;
  /**
   * Ramp rate R, kW per minute: |Δ net power| between adjacent intervals ≤ R·60·Δt
   * (net power = discharge − charge). Null or absent = no limit. Solved on the LP path.
   */
  readonly rampKwPerMin?: number | null;
  /**
   * Switching cost s, currency per MW of change in net power between adjacent
   * intervals: a penalty against chatter, reported as `switchingPenalty`, not cash.
   * Null or absent = none. Solved on the LP path.
   */
  readonly switchingCostPerMw?: number | null;
  /**
   * Equivalent full cycles per day the battery is rated for (its warranty or datasheet), used only to flag
   * heavy cycling, never as a limit; absent or null = not known (then plans are flagged above 2 per day).
   */
  readonly maxRatedCyclesPerDay?: number | null;
}

/** Site parameters, the same keys as the command line's site JSON. */
export interface SiteParams {
  /** IANA time zone name, used for local days and clock slots. */
  readonly timezone: string;
  readonly importLimitKw: number | null;
  readonly exportLimitKw: number | null;
  /** Demand charge in currency per kW of peak import over the model; null = none. */
  readonly demandChargePerKw: number | null;
  /** ISO 4217 code of the site's money figures (e.g. EUR), for words only; absent = not known. */
  readonly currency?: string;
}

export type TerminalRule =
  | { readonly kind: 'free' }
  | { readonly kind: 'cyclic' }
  /** End SoC at least socPct % of nameplate energy. */
  | { readonly kind: 'target'; readonly socPct: number }
  /** End energy valued at valuePerMwh (the steady cycle's stored-energy value at the end time of day). */
  | { readonly kind: 'steady-value'; readonly valuePerMwh: number };

/** One dispatch problem on a regular time grid of N steps. */
export interface DispatchProblem {
  readonly stepHours: number;
  /** UTC epoch milliseconds of the start of each step (length N). */
  readonly timesMs: readonly number[];
  /** Import price per step, currency/MWh (length N). */
  readonly priceImport: readonly number[];
  /** Export price per step, currency/MWh (length N); equal to priceImport for pure arbitrage. */
  readonly priceExport: readonly number[];
  /** Site load per step, kW (length N); all zeros for pure arbitrage. */
  readonly loadKw: readonly number[];
  /** On-site generation per step, kW (length N); all zeros when none. */
  readonly generationKw: readonly number[];
  readonly battery: BatteryParams;
  readonly site: SiteParams;
  /** Energy at the start of step 0, kWh. */
  readonly initialEnergyKwh: number;
  readonly terminal: TerminalRule;
  /** Local-day index per step (length N), used by the daily throughput cap. */
  readonly dayIndex: readonly number[];
  /**
   * When true, e_0 is a decision variable inside the SoC window and initialEnergyKwh
   * is ignored (the steady cycle: terminal `cyclic` with a free start). Only the LP
   * path solves such problems.
   */
  readonly freeInitialEnergy?: boolean;
  /** Peak import already reached before step 0, kW (receding horizon with a demand charge); default 0. */
  readonly peakFloorKw?: number;
  /** Energy already discharged earlier in the local day of step 0, kWh (receding horizon with a throughput cap); default 0. */
  readonly dischargedFirstDayKwh?: number;
  /** Share (0–1) of both power ratings usable per step (length N); absent = 1 throughout. */
  readonly availability?: readonly number[];
  /** Availability price of upward reserve per step, currency/MW/h (length N); absent = no upward reserve. */
  readonly reserveUpPrice?: readonly number[];
  /** Availability price of downward reserve per step, currency/MW/h (length N); absent = no downward reserve. */
  readonly reserveDownPrice?: readonly number[];
  /** Delivery duration D the energy headroom of held reserve must cover, hours (needed with reserve prices). */
  readonly reserveHours?: number;
  /**
   * Net battery power (discharge − charge, kW) in the interval before step 0. When
   * given, the ramp rate and the switching cost apply at step 0 too; absent, they
   * start at step 1 (nothing is known before t = 0).
   */
  readonly initialNetPowerKw?: number;
}

export type SolveStatus = 'optimal' | 'infeasible' | 'unbounded' | 'error';

/** Battery and grid power per step, kW (length N): the four power series of every schedule. */
export interface PowerSeries {
  readonly chargeKw: readonly number[];
  readonly dischargeKw: readonly number[];
  readonly gridImportKw: readonly number[];
  readonly gridExportKw: readonly number[];
}

/** The five series of a schedule: the power series and the energy stored, kWh (N + 1 entries, starting at e_0). */
export interface ScheduleSeries extends PowerSeries {
  readonly socKwh: readonly number[];
}

/** The same five series while they are being filled in. */
export type ScheduleSeriesBuilder = { -readonly [K in keyof ScheduleSeries]: number[] };

/** The solution of a DispatchProblem. Series have length N except socKwh (N + 1, starting at e_0). */
export interface DispatchSolution extends ScheduleSeries {
  readonly status: SolveStatus;
  /** Which algorithm produced it. */
  readonly method: 'dp' | 'lp';
  /** Human-readable reason when status is not optimal. */
  readonly message?: string;
  /** Objective value: cost + switching penalty − terminal value. */
  readonly objective: number;
  /** Money paid incl. degradation and demand charge, minus reserve revenue, excluding any terminal value (negative = earnings). */
  readonly cost: number;
  /** Value of one more MWh stored at the end of each step (dual of the SoC equation for e_{t+1}), currency/MWh. */
  readonly storedEnergyValue: readonly number[];
  readonly peakImportKw: number;
  /** Steps where the schedule charges and discharges at once (only pays at negative prices). */
  readonly simultaneousSteps?: readonly number[];
  /** LP backend that solved it (LP path only). */
  readonly backend?: 'highs' | 'glpk';
  /** True when a second solve broke a tie between several optimal schedules (LP path). */
  readonly tieBroken?: boolean;
  /** Wall-clock seconds of the solve. */
  readonly seconds?: number;
  /** Why this method solved it, when the exact dynamic program could not (e.g. reserves or a ramp rate). */
  readonly methodReason?: string;
  /** Upward and downward reserve held per step, kW (models with reserve prices only). */
  readonly reserveUpKw?: readonly number[];
  readonly reserveDownKw?: readonly number[];
  /** Reserve availability payments earned, currency (already subtracted from `cost`). */
  readonly reserveRevenue?: number;
  /** Switching penalty s·Σ|Δ net power|/1000, currency; not cash and not in `cost` (objective = cost + switchingPenalty − terminal value). */
  readonly switchingPenalty?: number;
  /** How often the operating limits of DESIGN section 3.3 bind (models that have them). */
  readonly limitBinding?: LimitBinding;
}

/** Number of intervals in which each operating limit binds (is met with equality). */
export interface LimitBinding {
  /** Intervals whose change of net power from the previous interval is at the ramp limit. */
  readonly rampIntervals: number;
  /** Intervals with availability below 1 where the derated power limit (with reserve) binds. */
  readonly availabilityIntervals: number;
  /** Intervals where charge/discharge plus reserve fill a power limit. */
  readonly reservePowerIntervals: number;
  /** Intervals where held reserve fills the energy headroom at the start or end of the interval. */
  readonly reserveEnergyIntervals: number;
  /** Intervals where held reserve fills the grid headroom. */
  readonly reserveGridIntervals: number;
  /** Adjacent intervals whose net power changes sign (charge to discharge or back). */
  readonly signChanges: number;
}
