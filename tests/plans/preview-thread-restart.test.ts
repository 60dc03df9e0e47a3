/**
 * A preview thread that keeps crashing is not restarted on every move of the
 * slider: after each crash in a row the next start waits twice as long (1 s,
 * 2 s, 4 s … up to a minute), previews in that pause get 503 with Retry-After,
 * and a thread that answers again resets the pause. The threads here are tiny
 * stand-ins (no engine), so only the restart policy is under test.
 */
import { Worker } from 'node:worker_threads';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { PlanInputs } from '@shared/schemas/plan';
import { PreviewBusyError, PreviewThread } from '../../server/horizon-preview/preview-thread-client';

/** A thread that dies while loading, as one whose engine files are missing would. */
const crashing = () => new Worker("throw new Error('the engine could not be loaded')", { eval: true });
/** A thread that answers every request (with a refusal, the simplest reply). */
const answering = () =>
  new Worker(
    `const { parentPort } = require('node:worker_threads');
     parentPort.on('message', (m) => parentPort.postMessage({ id: m.id, type: 'refused', refusal: { code: 'test', message: 'answered', status: 422 } }));`,
    { eval: true },
  );

const job = { key: 'k', inputs: {} as PlanInputs, horizonHours: 24, loadSeries: () => Promise.reject(new Error('not needed')) };
const outcome = (thread: PreviewThread) =>
  thread.run(job).then(
    () => 'solved',
    (error: Error) =>
      error instanceof PreviewBusyError ? { busy: error.message, retryAfter: error.retryAfterSeconds } : error.message,
  );

afterEach(() => {
  vi.useRealTimers();
});

describe('the preview thread after a crash', () => {
  it('waits 1 s, then 2 s, before starting again, answers 503 with Retry-After meanwhile, and resets once a thread answers', async () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(Date.parse('2026-03-02T00:00:00Z'));
    let spawned = 0;
    let healthy = false;
    const thread = new PreviewThread(8, () => {
      spawned++;
      return healthy ? answering() : crashing();
    });

    expect(await outcome(thread)).toEqual({ busy: expect.stringMatching(/stopped while computing/), retryAfter: 1 });
    expect(spawned).toBe(1);
    // [D] First crash: a pause of 1 s; a preview 0.5 s later is refused without starting a thread.
    vi.setSystemTime(Date.parse('2026-03-02T00:00:00.500Z'));
    const paused = await outcome(thread);
    expect(paused).toEqual({
      busy: expect.stringMatching(/stopped after a failure \(logged\) and restarts in 1 s/),
      retryAfter: 1,
    });
    expect(spawned).toBe(1);

    // After the pause a new thread starts; it crashes too, and the pause doubles to 2 s.
    vi.setSystemTime(Date.parse('2026-03-02T00:00:01.100Z'));
    await outcome(thread);
    expect(spawned).toBe(2);
    vi.setSystemTime(Date.parse('2026-03-02T00:00:02.600Z'));
    expect(await outcome(thread)).toEqual({ busy: expect.stringMatching(/restarts in 1 s/), retryAfter: 1 });
    vi.setSystemTime(Date.parse('2026-03-02T00:00:01.200Z'));
    expect(await outcome(thread)).toEqual({ busy: expect.stringMatching(/restarts in 2 s/), retryAfter: 2 });
    expect(spawned).toBe(2);

    // A thread that works answers, and the count of crashes in a row starts again from zero.
    healthy = true;
    vi.setSystemTime(Date.parse('2026-03-02T00:00:03.200Z'));
    expect(await outcome(thread)).toBe('answered');
    expect(spawned).toBe(3);
    await thread.close();
    // Closing is a shutdown, not a crash: the next preview starts a thread at once.
    expect(await outcome(thread)).toBe('answered');
    expect(spawned).toBe(4);
    await thread.close();
  });

  it('never pauses longer than a minute, however many crashes in a row', async () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    let now = Date.parse('2026-03-02T00:00:00Z');
    vi.setSystemTime(now);
    const thread = new PreviewThread(8, crashing);
    const pauses: number[] = [];
    for (let crash = 1; crash <= 9; crash++) {
      await outcome(thread); // starts a thread, which crashes
      const refused = await outcome(thread);
      expect(typeof refused).toBe('object');
      pauses.push((refused as { retryAfter: number }).retryAfter);
      now += 61_000;
      vi.setSystemTime(now);
    }
    // [D] 2^(n-1) seconds capped at 60: 1, 2, 4, 8, 16, 32, 60, 60, 60.
    expect(pauses).toEqual([1, 2, 4, 8, 16, 32, 60, 60, 60]);
  });
});
