import { passwordProblem } from './password-policy';

describe('passwordProblem', () => {
  it('accepts a long uncommon password', () => {
    expect(passwordProblem('password', 'quarry-lintel-7-basalt')).toBeNull();
  });

  it('refuses fewer than 10 characters, counting characters not bytes', () => {
    expect(passwordProblem('password', 'abc-def-9')).toBe(
      'password must be at least 10 characters long',
    );
    // Ten characters, twenty bytes: long enough.
    expect(passwordProblem('password', 'ééééééééé1')).toBeNull();
  });

  it('refuses more than 72 bytes, which bcrypt would silently cut', () => {
    expect(passwordProblem('password', 'x'.repeat(73))).toBe(
      'password must be at most 72 bytes long',
    );
    expect(passwordProblem('password', 'x'.repeat(71) + 'y')).toBeNull();
  });

  it('refuses common passwords whatever their case', () => {
    expect(passwordProblem('newPassword', 'password123')).toBe(
      'newPassword is one of the most common passwords; choose another',
    );
    expect(passwordProblem('newPassword', 'PASSWORD123')).not.toBeNull();
    expect(passwordProblem('newPassword', 'qwertyuiop')).not.toBeNull();
  });

  it('refuses a non-string', () => {
    expect(passwordProblem('password', 12345678901)).toBe('password must be a string');
  });
});
