import { passwordProblem, personalWords } from './password-policy';

describe('passwordProblem', () => {
  it('accepts a long uncommon password', () => {
    expect(passwordProblem('password', 'quarry-lintel-7-basalt')).toBeNull();
  });

  it('refuses fewer than 10 characters, counting characters not bytes', () => {
    expect(passwordProblem('password', 'abc-def-9')).toBe(
      'password must be at least 10 characters long',
    );
    // Ten characters, nineteen bytes: long enough.
    expect(passwordProblem('password', 'ěščřžýáíé1')).toBeNull();
  });

  it('refuses more than 72 bytes, which bcrypt would silently cut', () => {
    expect(passwordProblem('password', 'x'.repeat(73))).toBe(
      'password must be at most 72 bytes long',
    );
    expect(passwordProblem('password', 'quarry-lintel-7-basalt-'.repeat(3) + 'abc')).toBeNull();
  });

  it('refuses common passwords whatever their case', () => {
    expect(passwordProblem('newPassword', 'password123')).toBe(
      'newPassword is one of the most common passwords; choose another',
    );
    expect(passwordProblem('newPassword', 'PASSWORD123')).not.toBeNull();
    expect(passwordProblem('newPassword', 'qwertyuiop')).not.toBeNull();
  });

  it('refuses what zxcvbn scores below 3, saying why (Wheeler, USENIX Security 2016)', () => {
    // Each of these passed the length and common-list checks before.
    expect(passwordProblem('password', 'aaaaaaaaaa')).toMatch(
      /^password is too easy to guess: Repeated characters like "aaa" are easy to guess\./,
    );
    expect(passwordProblem('password', 'Password1!')).toMatch(
      /^password is too easy to guess: This is similar to a commonly used password\./,
    );
    expect(passwordProblem('password', '0123456789')).toMatch(
      /^password is too easy to guess: Common character sequences/,
    );
    // The person's own name and email count against a password built from them.
    const words = personalWords('Wilhelmina Rosenkranz', 'wilhelmina@firm.test');
    expect(words).toEqual([
      'Wilhelmina Rosenkranz',
      'wilhelmina',
      'rosenkranz',
      'wilhelmina@firm.test',
      'wilhelmina',
      'firm',
      'test',
    ]);
    expect(passwordProblem('password', 'wilhelminarosenkranz')).toBeNull();
    expect(passwordProblem('password', 'wilhelminarosenkranz', words)).toBe(
      'password is too easy to guess: There should not be any personal or page related data. Add more words that are less common.',
    );
  });

  it('refuses the published demo password, whatever the mode', () => {
    expect(passwordProblem('password', 'tiermode-demo')).toBe(
      'password is the published demo password; choose another',
    );
  });

  it('refuses a non-string', () => {
    expect(passwordProblem('password', 12345678901)).toBe('password must be a string');
  });
});
