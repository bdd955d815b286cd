import { describe, expect, it } from 'vitest';
import { fileSizeText } from './file-size-text';

describe('fileSizeText', () => {
  it('keeps small sizes in bytes', () => {
    expect(fileSizeText(0)).toBe('0 B');
    expect(fileSizeText(1023)).toBe('1023 B');
  });

  it('switches to kB and MB at 1024 and 1024²', () => {
    expect(fileSizeText(1024)).toBe('1.0 kB');
    expect(fileSizeText(1536)).toBe('1.5 kB');
    expect(fileSizeText(20 * 1024 * 1024)).toBe('20.0 MB');
  });
});
