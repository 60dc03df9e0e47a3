/**
 * Horizon preview latency for the API benchmark: POST
 * /api/plans/:id/horizon-preview over real HTTP for a one-day delivery window at
 * several horizons, p50/p95 of the round trip and of the engine time the server
 * reports. Requests are paced under the per-user rate limit (5 a second), so every
 * one is answered and none waits behind another.
 */
export interface BenchClient {
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- JSON of our own API; the caller knows its shape
  call(method: string, path: string, body?: unknown): Promise<{ status: number; body: any }>;
}

const PACE_MS = 220;

function quantiles(samples: number[]) {
  const s = [...samples].sort((a, b) => a - b);
  const at = (q: number) => s[Math.min(s.length - 1, Math.floor(q * s.length))] ?? NaN;
  const r = (v: number) => Math.round(v * 10) / 10;
  return { p50Ms: r(at(0.5)), p95Ms: r(at(0.95)), maxMs: r(s.at(-1) ?? NaN) };
}

async function previewOnce(client: BenchClient, planId: string, horizonHours: number) {
  const t = performance.now();
  const r = await client.call('POST', `/api/plans/${planId}/horizon-preview`, { horizonHours });
  const ms = performance.now() - t;
  if (r.status !== 200) throw new Error(`horizon preview ${horizonHours} h → ${r.status}: ${JSON.stringify(r.body)}`);
  return {
    ms,
    computeMs: r.body.computeMs as number,
    method: r.body.method as string,
    steps: (r.body.steps as unknown[]).length,
  };
}

/** The first preview of a plan reads and aligns its profiles and solves its steady cycle; later ones only re-plan. */
export async function measurePreview(client: BenchClient, planId: string, horizons: readonly number[], requests = 40) {
  const first = await previewOnce(client, planId, horizons[0]!);
  const byHorizon: Record<string, unknown> = {};
  for (const h of horizons) {
    const round: number[] = [];
    const engine: number[] = [];
    let steps = 0;
    for (let i = 0; i < requests; i++) {
      await new Promise((r) => setTimeout(r, PACE_MS));
      const one = await previewOnce(client, planId, h);
      round.push(one.ms);
      engine.push(one.computeMs);
      steps = one.steps;
    }
    byHorizon[`H${h}`] = { requests, steps, method: first.method, roundTrip: quantiles(round), engine: quantiles(engine) };
  }
  return { firstPreviewOfPlanMs: Math.round(first.ms * 10) / 10, ...byHorizon };
}
