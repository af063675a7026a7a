import { describe, expect, it } from 'vitest';
import { signUpSchema } from '../../../shared/schemas/auth';
import { assertStrongPassword, isCommonPassword, MIN_STRENGTH_SCORE, passwordScore } from './password-strength';

const passwordSignUpSchemaCheck = (password: string) =>
  signUpSchema.safeParse({ name: 'Mara', email: 'mara@example.test', password }).success;

describe('password strength', () => {
  // The patterns below are the ones zxcvbn models explicitly: repeats, sequences and keyboard walks
  // (D. Wheeler, "zxcvbn: Low-Budget Password Strength Estimation", USENIX Security 2016, section 3).
  it.each([
    'aaaaaaaaaaaa',
    'zzzzzzzzzzzzzzzz',
    '1234567890',
    '0987654321',
    'abcdefghijkl',
    'abcabcabcabc',
    'qwertyuiopas',
    'asdfghjkl;',
  ])('when the password is "%s", then it scores below the floor and is refused', (password) => {
    expect(passwordScore(password)).toBeLessThan(MIN_STRENGTH_SCORE);
    expect(() => assertStrongPassword(password)).toThrow(/too easy to guess|most common/);
  });

  it('when the password is on the common list, then it is named as such', () => {
    expect(isCommonPassword('Password123')).toBe(true);
    expect(() => assertStrongPassword('password123')).toThrow(/most common/);
  });

  it('when the password is a few unrelated words, then it passes', () => {
    // A passphrase of several words is the usual advice (NIST SP 800-63B, appendix A, on length over complexity).
    for (const password of [
      'solder-flux-and-patience',
      'grid leak and a cathode bypass',
      'a long evening with the dial cord',
    ])
      expect(() => assertStrongPassword(password)).not.toThrow();
  });

  it('when the password is built from the person’s own name or address, then that counts against it', () => {
    const inputs = ['mara.quillfeather@example.test', 'Mara Quillfeather'];
    expect(passwordScore('quillfeathermara', inputs)).toBeLessThan(passwordScore('quillfeathermara'));
    expect(passwordScore('quillfeathermara', inputs)).toBeLessThan(MIN_STRENGTH_SCORE);
  });

  it('when a password holds a control character, then the shared schema refuses it', () => {
    expect(passwordSignUpSchemaCheck('tab\there and more')).toBe(false);
    expect(passwordSignUpSchemaCheck('nul\u0000here and more')).toBe(false);
    expect(passwordSignUpSchemaCheck('c1 control \u0085 here')).toBe(false);
    expect(passwordSignUpSchemaCheck('plain words and a space')).toBe(true);
  });
});
