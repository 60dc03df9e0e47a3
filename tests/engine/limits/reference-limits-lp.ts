// The operating limits of DESIGN section 3.3 written out a second time, on top of
// the independent LP of DESIGN section 3 (tests/support/reference-lp.ts),
// with named variables and without the engine's model builder. Deliberately a
// different formulation where one exists: |Δ net power| is an epigraph variable
// w_t ≥ ±(p_t − p_{t−1}) and the ramp rate two inequalities on p_t − p_{t−1},
// where the engine splits the change into s⁺ − s⁻ with bounds.
//
//   r↑_t, r↓_t ≥ 0, cost −(ρ↑_t·r↑_t + ρ↓_t·r↓_t)·Δt/1000
//   d_t − c_t + r↑_t ≤ a_t·P_dis,   c_t − d_t + r↓_t ≤ a_t·P_ch,   c_t ≤ a_t·P_ch, d_t ≤ a_t·P_dis
//   e − r↑_t·D/η_dis ≥ E·soc_min and e + r↓_t·D·η_ch ≤ E·soc_max for e = e_t and e = e_{t+1}
//   x_t − m_t + r↑_t ≤ X_max,  m_t − x_t + r↓_t ≤ M_max   (where the limit exists)
//   |p_t − p_{t−1}| ≤ R·60·Δt and cost s·|p_t − p_{t−1}|/1000 for t ≥ 1 (and t = 0 from a given p_{−1})
import type { DispatchProblem } from '../../../server/engine/types';
import { referenceLp, type ReferenceLp } from '../../support/reference-lp';

type Row = ReferenceLp['rows'][number];

export function referenceLimitsLp(p: DispatchProblem): ReferenceLp {
  const base = referenceLp(p);
  const cost = new Map(base.cost);
  const box = new Map(base.box);
  const rows: Row[] = [...base.rows];
  const b = p.battery;
  const dt = p.stepHours;
  const n = p.priceImport.length;
  const eMin = (b.energyKwh * b.socMinPct) / 100;
  const eMax = (b.energyKwh * b.socMaxPct) / 100;
  const reserves = p.reserveUpPrice !== undefined || p.reserveDownPrice !== undefined;
  const D = p.reserveHours ?? 0;
  const ramp = b.rampKwPerMin ?? null;
  const s = b.switchingCostPerMw ?? 0;
  const net = (t: number): [string, number][] => [
    [`d${t}`, 1],
    [`c${t}`, -1],
  ];
  for (let t = 0; t < n; t++) {
    const a = p.availability?.[t] ?? 1;
    box.set(`c${t}`, [0, a * b.powerChargeKw]);
    box.set(`d${t}`, [0, a * b.powerDischargeKw]);
    if (reserves) {
      box.set(`ru${t}`, [0, p.reserveUpPrice ? Infinity : 0]);
      box.set(`rd${t}`, [0, p.reserveDownPrice ? Infinity : 0]);
      cost.set(`ru${t}`, (-(p.reserveUpPrice?.[t] ?? 0) * dt) / 1000);
      cost.set(`rd${t}`, (-(p.reserveDownPrice?.[t] ?? 0) * dt) / 1000);
      rows.push({ name: `pu${t}`, terms: [...net(t), [`ru${t}`, 1]], lo: -Infinity, hi: a * b.powerDischargeKw });
      rows.push({
        name: `pd${t}`,
        terms: [
          [`c${t}`, 1],
          [`d${t}`, -1],
          [`rd${t}`, 1],
        ],
        lo: -Infinity,
        hi: a * b.powerChargeKw,
      });
      for (const e of [`e${t}`, `e${t + 1}`]) {
        rows.push({
          name: `hu${t}${e}`,
          terms: [
            [e, 1],
            [`ru${t}`, -D / b.efficiencyDischarge],
          ],
          lo: eMin,
          hi: Infinity,
        });
        rows.push({
          name: `hd${t}${e}`,
          terms: [
            [e, 1],
            [`rd${t}`, D * b.efficiencyCharge],
          ],
          lo: -Infinity,
          hi: eMax,
        });
      }
      if (p.site.exportLimitKw !== null)
        rows.push({
          name: `gu${t}`,
          terms: [
            [`x${t}`, 1],
            [`m${t}`, -1],
            [`ru${t}`, 1],
          ],
          lo: -Infinity,
          hi: p.site.exportLimitKw,
        });
      if (p.site.importLimitKw !== null)
        rows.push({
          name: `gd${t}`,
          terms: [
            [`m${t}`, 1],
            [`x${t}`, -1],
            [`rd${t}`, 1],
          ],
          lo: -Infinity,
          hi: p.site.importLimitKw,
        });
    }
    // Change of net power into step t: p_t − p_{t−1} = Σ terms + constant (p_{−1} when given).
    const before = t > 0 ? null : (p.initialNetPowerKw ?? undefined);
    if (t === 0 && before === undefined) continue;
    const change: [string, number][] = t > 0 ? [...net(t), [`d${t - 1}`, -1], [`c${t - 1}`, 1]] : net(t);
    const constant = t > 0 ? 0 : before!;
    if (ramp !== null) {
      const r = ramp * 60 * dt;
      rows.push({ name: `ramp${t}`, terms: change, lo: constant - r, hi: constant + r });
    }
    if (s > 0) {
      box.set(`w${t}`, [0, Infinity]);
      cost.set(`w${t}`, s / 1000);
      // w ≥ Δ and w ≥ −Δ, with Δ = change − constant
      rows.push({
        name: `wu${t}`,
        terms: [[`w${t}`, 1], ...change.map(([v, k]) => [v, -k] as [string, number])],
        lo: -constant,
        hi: Infinity,
      });
      rows.push({ name: `wd${t}`, terms: [[`w${t}`, 1], ...change], lo: constant, hi: Infinity });
    }
  }
  return { cost, box, rows, steps: base.steps };
}
