import { describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { getDb } from '../../server/db/client';
import { users } from '../../server/users/users.schema';
import { hashPassword, verifyPassword } from '../../server/auth/password-hash';
import { passwordProblems } from '../../server/auth/password-policy';
import { createTestApp } from '../support/test-app';
import { signInAs } from '../support/auth';

const app = createTestApp();

describe('stored password hashes', () => {
  it('are argon2id v19 with m=19456 KiB, t=2, p=1 (ASVS 5.0 appendix C; OWASP Password Storage Cheat Sheet)', async () => {
    const stored = await hashPassword('harbour lights at low tide');
    expect(stored.startsWith('$argon2id$v=19$m=19456,t=2,p=1$')).toBe(true);
    expect(await verifyPassword(stored, 'harbour lights at low tide')).toBe(true);
    expect(await verifyPassword(stored, 'harbour lights at high tide')).toBe(false);
  });

  it('are what a user signing in through the API gets in the database', async () => {
    const agent = await signInAs(app, 'viewer');
    await agent
      .post('/api/auth/password')
      .send({ currentPassword: agent.user.password, newPassword: 'quiet estuary morning fog' })
      .expect(204);
    const [row] = await getDb().select().from(users).where(eq(users.id, agent.user.id));
    expect(row?.passwordHash?.startsWith('$argon2id$v=19$m=19456,t=2,p=1$')).toBe(true);
  });
});

describe('the new-password policy', () => {
  it('accepts 12 to 128 characters counted as characters, so 12 emoji are long enough (ASVS 4.0.3 2.1.1-2.1.2)', () => {
    expect(passwordProblems('a'.repeat(3) + 'bcdefghijk')).toEqual([]); // 13 characters
    expect(passwordProblems('short-pass1')).toEqual(['Use at least 12 characters.']); // 11
    expect(passwordProblems('🌊🔋⚡🌙'.repeat(3))).toEqual([]); // 12 code points, 21 UTF-16 units
    expect(passwordProblems('🌊🔋🌙'.repeat(3) + '🌊🔋')).toEqual(['Use at least 12 characters.']); // 11 code points, 22 units
    expect(passwordProblems('x'.repeat(64) + 'y'.repeat(64))).toEqual([]); // 128 allowed (ASVS asks for at least 64)
    expect(passwordProblems('x'.repeat(65) + 'y'.repeat(64))).toEqual(['Use at most 128 characters.']);
  });

  it('allows spaces and any characters, with no composition rules (ASVS 4.0.3 2.1.9)', () => {
    expect(passwordProblems('all lower case words here')).toEqual([]);
  });

  it('rejects common passwords, common words padded with digits, and one repeated character (ASVS 5.0 6.2.4)', () => {
    expect(passwordProblems('password1234')[0]).toMatch(/most common passwords/);
    expect(passwordProblems('Password!2026')[0]).toMatch(/most common passwords/);
    expect(passwordProblems('123456789012')[0]).toMatch(/most common passwords/);
    expect(passwordProblems('QWERTYUIOP123')[0]).toMatch(/most common passwords/);
    expect(passwordProblems('zzzzzzzzzzzzzz')[0]).toMatch(/one repeated character/);
  });

  it('rejects the demo password printed in the README and context words (ASVS 5.0 6.2.11)', () => {
    expect(passwordProblems('slackwater-demo').length).toBeGreaterThan(0);
    expect(passwordProblems('my slackwater login')).toContain('Do not use the name of this application in your password.');
    expect(passwordProblems('marina.vale-secret-99', { email: 'marina.vale@example.com' })).toContain(
      'Do not use your e-mail address in your password.',
    );
    expect(passwordProblems('tidewater-Jonas Berg-1', { name: 'Jonas Berg' })).toContain(
      'Do not use your name in your password.',
    );
  });
});
