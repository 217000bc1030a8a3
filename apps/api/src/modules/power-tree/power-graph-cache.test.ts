import etag from 'etag';
import { describe, expect, it } from 'vitest';
import { weakEtag } from './power-graph-cache';

// Reference: the `etag` package from npm, which Express itself uses for `res.send` (weak tags by default).
describe('weakEtag', () => {
  it.each([
    ['an empty body', ''],
    ['a small JSON object', '{"board":"demo","nodes":[]}'],
    ['text with characters outside ASCII', '{"note":"Ω and µF — 3,3 V"}'],
    ['a long body', JSON.stringify({ rails: Array.from({ length: 2000 }, (_, i) => `VCC_${i}`) })],
  ])('gives the same tag as Express would for %s', (_what, text) => {
    expect(weakEtag(text)).toBe(etag(text, { weak: true }));
  });

  it('gives different tags to bodies that differ in one character', () => {
    expect(weakEtag('{"a":1}')).not.toBe(weakEtag('{"a":2}'));
  });
});
