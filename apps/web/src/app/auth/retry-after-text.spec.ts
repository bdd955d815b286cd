import { retryAfterText } from './retry-after-text';

describe('retryAfterText', () => {
  it('reads seconds', () => {
    expect(retryAfterText('30')).toBe('Try again in 30 seconds.');
    expect(retryAfterText('1')).toBe('Try again in 1 second.');
  });

  it('rounds up to whole minutes past one minute', () => {
    expect(retryAfterText('61')).toBe('Try again in 2 minutes.');
    expect(retryAfterText('60')).toBe('Try again in 1 minute.');
  });

  it('reads an HTTP date', () => {
    const now = new Date('2026-03-01T10:00:00Z');
    expect(retryAfterText('Sun, 01 Mar 2026 10:05:00 GMT', now)).toBe('Try again in 5 minutes.');
  });

  it('falls back to "later" without a usable header', () => {
    expect(retryAfterText(null)).toBe('Try again later.');
    expect(retryAfterText('soon')).toBe('Try again later.');
  });
});
