/**
 * Passwords that appear near the top of published breach-frequency lists, restricted to
 * those a 12-character minimum still admits, plus the demo password printed in our README.
 * [M] Compiled from memory of widely circulated "most common passwords" lists; it is a
 * short list on purpose (ASVS 5.0 6.2.4 asks for the top ~3000 of a breach corpus; ours
 * is a floor, and the base-word rule in password-policy.ts widens its reach).
 */
// prettier-ignore
export const commonPasswords = new Set([
  '123456789012', '1234567890123', '12345678901234', '123456789123', '123123123123', '111111111111',
  '000000000000', '121212121212', '123456123456', '987654321098', '098765432112', '147258369147',
  '1q2w3e4r5t6y', '1q2w3e4r5t6y7u', 'q1w2e3r4t5y6', '1qaz2wsx3edc', 'zaq12wsxcde3', 'zaq1zaq1zaq1',
  'qwertyuiop12', 'qwertyuiop123', 'qwerty123456', 'qwertyqwerty', 'asdfghjkl123', 'asdfasdfasdf',
  'zxcvbnm12345', 'qazwsxedcrfv', 'abcdefghijkl', 'abcdefg12345', 'abc123abc123', 'abcd12345678',
  'password1234', 'password12345', 'password123456', 'passwordpassword', 'password!123', 'p@ssw0rd1234',
  'p@ssword1234', 'passw0rd1234', 'mypassword123', 'newpassword123', 'iloveyou1234', 'iloveyouiloveyou',
  'letmein12345', 'letmeinletmein', 'welcome12345', 'welcome123456', 'welcometo2024', 'changeme1234',
  'changemechangeme', 'administrator', 'administrator1', 'admin1234567', 'adminadmin123', 'trustno1trustno1',
  'football1234', 'baseball1234', 'basketball12', 'superman1234', 'batman123456', 'starwars1234',
  'sunshine1234', 'princess1234', 'dragon123456', 'monkey123456', 'shadow123456', 'master123456',
  'michael12345', 'jennifer1234', 'jordan231234', 'liverpool123', 'chelsea12345', 'arsenal12345',
  'computer1234', 'internet1234', 'whatever1234', 'summer2024!!', 'winter2024!!', 'spring2024!!',
  'autumn2024!!', 'january12345', 'december1234', 'qwerty123456789', 'q1w2e3r4t5y6u7i8', 'aaaaaa111111',
  'slackwater-demo', 'slackwaterdemo', 'slackwater123',
]);

/** Words that stay guessable whatever digits or symbols are wrapped around them. */
// prettier-ignore
export const guessableBaseWords = new Set([
  'password', 'passwort', 'passw', 'qwerty', 'qwertyuiop', 'asdfgh', 'asdfghjkl', 'zxcvbnm', 'letmein',
  'welcome', 'iloveyou', 'admin', 'administrator', 'changeme', 'monkey', 'dragon', 'football', 'baseball',
  'sunshine', 'princess', 'master', 'shadow', 'superman', 'batman', 'trustno', 'secret', 'login', 'abc',
  'abcdef', 'qazwsx', 'test', 'guest', 'user', 'root', 'default', 'slackwater',
]);
