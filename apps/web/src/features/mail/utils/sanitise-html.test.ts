import { describe, expect, it } from 'vitest';
import { sanitiseMailHtml } from './sanitise-html';

describe('sanitiseMailHtml', () => {
  it('removes scripts, frames, forms and event handlers, and blocks the network', () => {
    const html = sanitiseMailHtml(
      '<p onclick="steal()">Order <b>PO-0001</b></p><script>alert(1)</script><iframe src="https://x.test"></iframe>' +
        '<form action="https://x.test"><input name="a"></form><img src="https://tracker.test/pixel.gif" onerror="x()">',
    );
    expect(html).toContain('Order <b>PO-0001</b>');
    expect(html).not.toMatch(/script|iframe|<form|<input|onclick|onerror/i);
    expect(html).toContain("default-src 'none'");
  });

  it.each([
    ['javascript:alert(1)', false],
    ['  JaVa\tScRiPt:alert(1)', false],
    ['data:text/html,<b>x</b>', false],
    ['https://supplier.test/orders', true],
    ['mailto:orders@supplier.test', true],
  ])('keeps the link %j: %s', (href, kept) => {
    const html = sanitiseMailHtml(`<a href="${href}">link</a>`);
    expect(html.includes('href=')).toBe(kept);
  });
});
