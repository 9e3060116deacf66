/** fontkit ships no types; pdfkit needs only that a parsed font has a `layout` method. */
declare module 'fontkit' {
  interface Font {
    layout(text: string): unknown;
  }
  export function create(buffer: Uint8Array, postscriptName?: string): Font;
}
