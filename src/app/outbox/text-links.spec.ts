import { describe, expect, it } from 'vitest';
import { textParts } from './text-links';

describe('textParts', () => {
  it('finds the http(s) links of a mail, leaving a closing full stop outside them', () => {
    expect(textParts('Download it at http://127.0.0.1:3000/api/pack-links/abc.def.\nThanks')).toEqual([
      { value: 'Download it at ', link: false },
      { value: 'http://127.0.0.1:3000/api/pack-links/abc.def', link: true },
      { value: '.\nThanks', link: false },
    ]);
  });

  it('leaves text without links as it is, and never makes a link of another scheme', () => {
    expect(textParts('No link here')).toEqual([{ value: 'No link here', link: false }]);
    expect(textParts('javascript:alert(1) ftp://x')).toEqual([{ value: 'javascript:alert(1) ftp://x', link: false }]);
    expect(textParts('(https://a.example/x)')).toEqual([{ value: '(', link: false }, { value: 'https://a.example/x', link: true }, { value: ')', link: false }]);
  });
});
