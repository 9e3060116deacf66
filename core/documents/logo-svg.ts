/**
 * The shop's SVG logo, cleaned before any writer uses it: nothing in it may reach outside the drawing.
 * Kept: shapes, text, gradients and references inside the file (href="#id", url(#id)), raster images
 * embedded as PNG or JPEG data. Dropped: scripts, foreign content, DTDs and entities, event handlers,
 * external styles, and every link to a file or address (an <image> naming a path would make the PDF
 * writer embed that local file in every document).
 */
const EMBEDDED_RASTER = /^data:image\/(png|jpeg);base64,[A-Za-z0-9+/=\s]*$/;
const DROPPED_ELEMENTS = ['script', 'foreignObject', 'iframe', 'object', 'embed', 'audio', 'video', 'handler', 'listener'];

const elementPattern = (name: string) => new RegExp(`<${name}\\b[^>]*?(\\/>|>[\\s\\S]*?<\\/${name}\\s*>)`, 'gi');
const openTagPattern = (name: string) => new RegExp(`<\\/?${name}\\b[^>]*>`, 'gi');

/** The value of href or xlink:href in one start tag, or undefined. */
function linkOf(tag: string): string | undefined {
  const m = /\s(?:xlink:)?href\s*=\s*("([^"]*)"|'([^']*)')/i.exec(tag);
  return m ? (m[2] ?? m[3] ?? '') : undefined;
}

const localOrRaster = (link: string): boolean => link.trim().startsWith('#') || EMBEDDED_RASTER.test(link.trim());

function cleanImages(svg: string): string {
  return svg.replace(elementPattern('image'), (element) => {
    const link = linkOf(element) ?? '';
    return EMBEDDED_RASTER.test(link.trim()) ? element : '';
  });
}

/** In every other start tag: no event handlers, no links out, no url() that is not #local. */
function cleanAttributes(svg: string): string {
  return svg.replace(/<([A-Za-z][\w:.-]*)(\s[^<>]*?)?(\/?)>/g, (_tag, name: string, attrs: string | undefined, close: string) => {
    let a = attrs ?? '';
    a = a.replace(/\s+on[\w-]+\s*=\s*("[^"]*"|'[^']*'|[^\s>]+)/gi, '');
    a = a.replace(/\s+(?:xlink:)?href\s*=\s*("([^"]*)"|'([^']*)')/gi, (whole, _q, d?: string, s?: string) =>
      (localOrRaster(d ?? s ?? '') ? whole : ''));
    a = cleanUrls(a);
    return `<${name}${a}${close}>`;
  });
}

const cleanUrls = (text: string): string =>
  text.replace(/url\(\s*(['"]?)([^)'"]*)\1\s*\)/gi, (whole, _q, target: string) => (target.trim().startsWith('#') ? whole : 'none'));

function cleanStyles(svg: string): string {
  return svg.replace(/(<style\b[^>]*>)([\s\S]*?)(<\/style\s*>)/gi, (_all, open: string, body: string, close: string) =>
    `${open}${cleanUrls(body.replace(/@import[^;]*;?/gi, ''))}${close}`);
}

/** The logo's SVG text cleaned, or null when the text is not an SVG document. */
export function cleanLogoSvg(svg: string): string | null {
  let out = svg.replace(/<!DOCTYPE[\s\S]*?(\[[\s\S]*?\])?\s*>/gi, '').replace(/<!ENTITY[\s\S]*?>/gi, '')
    .replace(/<!--[\s\S]*?-->/g, '').replace(/<\?(?!xml\s)[\s\S]*?\?>/gi, '');
  if (!/<svg\b/i.test(out)) return null;
  for (const name of DROPPED_ELEMENTS) out = out.replace(elementPattern(name), '').replace(openTagPattern(name), '');
  return cleanAttributes(cleanStyles(cleanImages(out)));
}
