/**
 * The turnpike figures in plain words. The wording is the product's contract:
 * the example "stays near the steady cycle 86 % of the time; the
 * last 5 h leave it: energy is sold off because nothing values it after the horizon".
 */
import { describe, expect, it } from 'vitest';
import { durationWords, turnpikeSentence } from '../../server/plans/insights/plan-words';

const figures = {
  bandPct: 5,
  bandKwh: 80,
  nearSteadyShare: 0.86,
  entryArcSteps: 0,
  leavingArcSteps: 20,
  commitWindowSteps: null,
  longerLookaheadHours: null,
  value: { bandPerMwh: 3, nearSteadyShare: 0.8, entryArcSteps: 0, leavingArcSteps: 0, commitWindowSteps: null },
  flags: [],
};

describe('the turnpike sentence', () => {
  it('reads like the example for a free end with 15-minute steps', () => {
    // [D] 20 steps of 15 minutes = 5 h.
    expect(turnpikeSentence(figures, 15, 'free')).toBe(
      'Stays near the steady cycle 86 % of the time (within 5 % of usable energy); the last 5 h leave it: energy is sold off because nothing values it after the horizon.',
    );
  });

  it('names the entry arc, the reason of each terminal rule and the commit window', () => {
    const text = turnpikeSentence(
      { ...figures, entryArcSteps: 3, commitWindowSteps: 96, longerLookaheadHours: 192 },
      15,
      'target:80',
    );
    expect(text).toContain('the first 45 min approach it from the starting SoC');
    expect(text).toContain('the plan steers to its end target of 80 % SoC');
    expect(text).toContain('The first 24 h agree with a plan looking 192 h ahead: that part is safe to commit.');
    expect(turnpikeSentence({ ...figures, leavingArcSteps: 0 }, 60, 'steady-value')).toContain(
      'it does not leave the steady cycle before the end of the horizon',
    );
    expect(turnpikeSentence(figures, 60, 'cyclic')).toContain(
      'the last 20 h leave it: the plan steers back to the SoC it started with',
    );
  });

  it('names the excursions between the arcs and never says the plan stays when it leaves', () => {
    // [D] 28 steps of 15 minutes = 7 h outside the band in 2 stretches, at most 0.67 of usable energy away.
    const away = { ...figures, leavingArcSteps: 0, excursions: { count: 2, steps: 28, largestDistance: 0.67 } };
    const text = turnpikeSentence(away, 15, 'steady-value');
    expect(text).toContain('in between it leaves the band twice, for 7 h in all, at most 67 % of usable energy away');
    expect(text).toContain('it is back near the steady cycle at the end of the horizon');
    expect(text).not.toContain('does not leave');
    // [D] one stretch of 3 steps of 60 minutes, then a leaving arc of 20 h: both clauses, in that order.
    const once = turnpikeSentence({ ...figures, excursions: { count: 1, steps: 3, largestDistance: 0.2 } }, 60, 'free');
    expect(once).toContain(
      'in between it leaves the band once, for 3 h, at most 20 % of usable energy away; the last 20 h leave it',
    );
  });

  it('keeps the old sentence for plans with no excursions, counted or not', () => {
    const none = { ...figures, leavingArcSteps: 0, excursions: { count: 0, steps: 0, largestDistance: 0 } };
    const text = turnpikeSentence(none, 60, 'steady-value');
    expect(text).toContain('it does not leave the steady cycle before the end of the horizon');
    expect(text).not.toContain('in between');
    expect(turnpikeSentence({ ...figures, leavingArcSteps: 0 }, 60, 'steady-value')).toBe(text);
  });

  it('says durations in minutes below an hour and in hours above', () => {
    expect(durationWords(3, 15)).toBe('45 min');
    expect(durationWords(6, 15)).toBe('1.5 h');
    expect(durationWords(48, 60)).toBe('48 h');
  });
});
