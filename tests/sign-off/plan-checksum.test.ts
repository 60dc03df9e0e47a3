/**
 * The sign-off checksum: SHA-256 over RFC 8785 canonical JSON. Checked against
 * the RFC's examples, the `canonicalize` package (an independent RFC 8785
 * implementation from the registry) and coreutils' sha256sum.
 */
import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import canonicalize from 'canonicalize';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { canonicalJson, CanonicalJsonError } from '../../server/sign-off/canonical-json';
import { checksumMatches, checksumText, planChecksum } from '../../server/sign-off/plan-checksum';

describe('canonical JSON (RFC 8785)', () => {
  it('serialises numbers, strings and literals as the RFC example shows', () => {
    // [M] the example of RFC 8785 section 3.2.2, reproduced from memory; the
    // canonicalize package agrees on it (checked below), which it would not if misremembered.
    const input = JSON.parse(
      '{"numbers":[333333333.33333329,1E30,4.50,2e-3,0.000000000000000000000000001],' +
        '"string":"\\u20ac$\\u000F\\u000aA\'\\u0042\\u0022\\u005c\\\\\\"\\/","literals":[null,true,false]}',
    );
    const expected =
      '{"literals":[null,true,false],"numbers":[333333333.3333333,1e+30,4.5,0.002,1e-27],"string":"€$\\u000f\\nA\'B\\"\\\\\\\\\\"/"}';
    expect(canonicalJson(input)).toBe(expected);
    expect(canonicalize(input)).toBe(expected);
  });

  it('sorts member names by UTF-16 code units, as the RFC sorting example shows', () => {
    // [M] RFC 8785 section 3.2.3 example, from memory: CR, "1", U+0080, ö, €, 😀 (a surrogate pair), U+FB33.
    const input = {
      '\u20ac': 'Euro Sign',
      '\r': 'Carriage Return',
      '\ufb33': 'Hebrew Letter Dalet With Dagesh',
      '1': 'One',
      '\ud83d\ude00': 'Emoji: Grinning Face',
      '\u0080': 'Control',
      '\u00f6': 'Latin Small Letter O With Diaeresis',
    };
    // Read the order from the text: JSON.parse would move the integer-like key "1" first.
    const names = [...canonicalJson(input).matchAll(/":"([^"]+)"/g)].map((m) => m[1]);
    expect(names).toEqual([
      'Carriage Return',
      'One',
      'Control',
      'Latin Small Letter O With Diaeresis',
      'Euro Sign',
      'Emoji: Grinning Face',
      'Hebrew Letter Dalet With Dagesh',
    ]);
    expect(canonicalJson(input)).toBe(canonicalize(input));
  });

  it('agrees with the canonicalize package on arbitrary JSON values', () => {
    // [S: canonicalize, an RFC 8785 implementation by one of the RFC's authors]
    fc.assert(
      fc.property(fc.jsonValue(), (value) => {
        expect(canonicalJson(value)).toBe(canonicalize(value));
      }),
      { numRuns: 300 },
    );
  });

  it('refuses values JSON cannot hold instead of hashing something else', () => {
    expect(() => canonicalJson({ a: [1, Number.NaN] })).toThrow(CanonicalJsonError);
    expect(() => canonicalJson({ a: Number.POSITIVE_INFINITY })).toThrow(/\$\.a is Infinity/);
  });
});

describe('plan checksum', () => {
  const content = {
    planId: '7d0f4b8e-0000-4000-8000-000000000001',
    inputs: { battery: { energyKwh: 4000, socMinPct: 10 }, prices: [42.5, -3.25] },
    results: { chargeKw: [1000, 0], dischargeKw: [0, 810] },
  };

  it('is SHA-256 as published: the FIPS 180 test vector for "abc"', () => {
    // [S: FIPS 180-2, Appendix B.1] SHA-256("abc").
    expect(createHash('sha256').update('abc').digest('hex')).toBe(
      'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad',
    );
  });

  it('equals sha256sum of the canonical text, so anyone can reproduce it outside Slackwater', () => {
    // [S: GNU coreutils sha256sum, an independent SHA-256 implementation]
    const out = execFileSync('sha256sum', [], { input: checksumText(content) }).toString();
    expect(planChecksum(content)).toBe(out.slice(0, 64));
  });

  it('does not depend on the order of object members (jsonb does not keep it)', () => {
    const reordered = {
      results: { dischargeKw: [0, 810], chargeKw: [1000, 0] },
      inputs: { prices: [42.5, -3.25], battery: { socMinPct: 10, energyKwh: 4000 } },
      planId: content.planId,
    };
    expect(planChecksum(reordered)).toBe(planChecksum(content));
  });

  it('changes when any number of the inputs or results changes', () => {
    const changed = { ...content, results: { ...content.results, dischargeKw: [0, 810.0001] } };
    expect(planChecksum(changed)).not.toBe(planChecksum(content));
    expect(planChecksum({ ...content, planId: content.planId.replace('1', '2') })).not.toBe(planChecksum(content));
  });

  it('verifies a stored checksum and rejects a wrong or malformed one', () => {
    const sum = planChecksum(content);
    expect(checksumMatches(sum, content)).toBe(true);
    expect(
      checksumMatches(
        sum.replace(/^./, (c) => (c === '0' ? '1' : '0')),
        content,
      ),
    ).toBe(false);
    expect(checksumMatches('not-a-checksum', content)).toBe(false);
    expect(checksumMatches(null, content)).toBe(false);
  });
});
