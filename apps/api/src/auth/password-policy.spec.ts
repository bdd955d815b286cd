import { describe, expect, it } from 'vitest';
import { passwordWeakness } from './password-policy';

describe('passwordWeakness', () => {
  it('accepts a long passphrase of unrelated words', () => {
    expect(passwordWeakness('Gusty-Lantern-Orchard-73', ['someone@example.com', 'Some One'])).toBeNull();
  });

  it('rejects a common password and says why with a suggestion', () => {
    const reason = passwordWeakness('password1234', []);
    expect(reason).toMatch(/^This password is too easy to guess\. .+/);
  });

  it('rejects a keyboard walk', () => {
    expect(passwordWeakness('qwertyuiop12', [])).not.toBeNull();
  });

  it('counts the person’s own name and e-mail as guessable', () => {
    expect(passwordWeakness('MarigoldFeatherstonehaugh', [])).toBeNull();
    expect(passwordWeakness('MarigoldFeatherstonehaugh', ['m.f@example.com', 'Marigold Featherstonehaugh'])).toMatch(/personal/);
  });

  it('splits the e-mail so its local part counts on its own', () => {
    expect(passwordWeakness('quillfenbridgeworks', ['quillfenbridgeworks@example.com'])).not.toBeNull();
  });
});
