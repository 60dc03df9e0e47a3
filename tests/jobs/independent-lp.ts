// Pure-arbitrage storage LP (DESIGN section 3 with L = G = 0 and no grid limits)
// written out here, independently of the engine, for javascript-lp-solver 1.0.3
// (a pure-JavaScript simplex solver from the npm registry). Model [S: Hashmi et
// al. 2019, arXiv 1905.00418; Bradbury et al. 2014]:
//   max Σ p_t (d_t − c_t) Δt/1000
//   e_{t+1} = e_t + η_ch c_t Δt − d_t Δt/η_dis,  Emin ≤ e_{t+1} ≤ Emax,  0 ≤ c ≤ Pc, 0 ≤ d ≤ Pd.
import solver from 'javascript-lp-solver';

export interface ArbitrageCase {
  prices: readonly number[];
  stepHours: number;
  powerKw: number;
  energyKwh: number;
  socMinPct: number;
  socMaxPct: number;
  etaCharge: number;
  etaDischarge: number;
  initialKwh: number;
}

/** The optimal profit (currency) over the whole series, with a free end. */
export function optimalArbitrageProfit(c: ArbitrageCase): number {
  const constraints: Record<string, { equal?: number; max?: number; min?: number }> = {};
  const variables: Record<string, Record<string, number>> = {};
  const emin = (c.energyKwh * c.socMinPct) / 100;
  const emax = (c.energyKwh * c.socMaxPct) / 100;
  c.prices.forEach((p, t) => {
    constraints[`bal${t}`] = { equal: t === 0 ? c.initialKwh : 0 };
    constraints[`capc${t}`] = { max: c.powerKw };
    constraints[`capd${t}`] = { max: c.powerKw };
    constraints[`hi${t}`] = { max: emax };
    constraints[`lo${t}`] = { min: emin };
    variables[`c${t}`] = { profit: (-p * c.stepHours) / 1000, [`bal${t}`]: -c.etaCharge * c.stepHours, [`capc${t}`]: 1 };
    variables[`d${t}`] = { profit: (p * c.stepHours) / 1000, [`bal${t}`]: c.stepHours / c.etaDischarge, [`capd${t}`]: 1 };
    // e_{t+1} appears in its own balance row (+1) and in the next one (−1).
    variables[`e${t + 1}`] = {
      [`bal${t}`]: 1,
      ...(t + 1 < c.prices.length ? { [`bal${t + 1}`]: -1 } : {}),
      [`hi${t}`]: 1,
      [`lo${t}`]: 1,
    };
  });
  const result = solver.Solve({ optimize: 'profit', opType: 'max', constraints, variables }) as {
    feasible: boolean;
    result: number;
  };
  if (!result.feasible) throw new Error('the independent LP is infeasible');
  return result.result;
}
