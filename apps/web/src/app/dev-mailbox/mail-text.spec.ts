import { splitLinks } from './mail-text';

describe('splitLinks', () => {
  it('separates links from the text around them', () => {
    expect(splitLinks('Open:\nhttp://127.0.0.1:3100/accept-invitation?token=abc\nThanks')).toEqual([
      { text: 'Open:\n', href: null },
      { text: 'http://127.0.0.1:3100/accept-invitation?token=abc', href: 'http://127.0.0.1:3100/accept-invitation?token=abc' },
      { text: '\nThanks', href: null },
    ]);
  });

  it('never turns other schemes into links', () => {
    expect(splitLinks('javascript:alert(1)')).toEqual([{ text: 'javascript:alert(1)', href: null }]);
  });
});
