import { describe, expect, it } from 'vitest';
import { cleanLogoSvg } from '../../core/documents';

const PNG = 'data:image/png;base64,iVBORw0KGgo=';

describe('the shop logo SVG is cleaned before use', () => {
  it('drops images that name a file or address, and keeps embedded PNG or JPEG data', () => {
    const svg = `<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink">
      <image href="/etc/hostname" width="10" height="10"/>
      <image xlink:href='file:///home/shop/secret.png' width="10" height="10"></image>
      <image href="https://tracker.example/x.png"/>
      <image href="${PNG}" width="4" height="4"/>
      <rect width="5" height="5" fill="#123"/></svg>`;
    const out = cleanLogoSvg(svg)!;
    expect(out).not.toMatch(/hostname|secret\.png|tracker\.example/);
    expect(out).toContain(PNG);
    expect(out).toContain('<rect width="5" height="5" fill="#123"/>');
  });

  it('drops scripts, foreign content, DTD entities, handlers, external styles and links out', () => {
    const svg = `<?xml version="1.0"?><!DOCTYPE svg [<!ENTITY x SYSTEM "file:///etc/passwd">]>
      <svg onload="alert(1)"><script>alert(2)</script><foreignObject><div>x</div></foreignObject>
      <style>@import url(https://fonts.example/a.css); .a { fill: url(https://x.example/p.svg#g) } .b { fill: url(#local) }</style>
      <use href="other.svg#part"/><use href="#logo-mark"/><a xlink:href="javascript:alert(3)"><text>Shop</text></a>
      <rect style="fill:url('/tmp/pattern.svg#p')" filter="url(#soft)"/></svg>`;
    const out = cleanLogoSvg(svg)!;
    for (const gone of ['ENTITY', 'passwd', 'onload', 'script', 'alert', 'foreignObject', '@import', 'fonts.example', 'x.example', 'other.svg', '/tmp/pattern']) {
      expect(out, gone).not.toContain(gone);
    }
    for (const kept of ['url(#local)', 'href="#logo-mark"', 'url(#soft)', '<text>Shop</text>']) expect(out, kept).toContain(kept);
  });

  it('answers null for text that is not an SVG', () => {
    expect(cleanLogoSvg('<html><body>no</body></html>')).toBeNull();
  });
});
