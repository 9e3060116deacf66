/** Where `char` next occurs from `from` on, or the end of the text. */
function indexOrEnd(text: string, char: string, from: number): number {
  const at = text.indexOf(char, from);
  return at < 0 ? text.length : at;
}

/**
 * Reads a JSON document in pieces and hands out the items of one top-level list ("jobs") one at a time,
 * as text, so a document of any length is never held whole. Everything else in the document is kept as
 * its head, with the list left empty, and checked when the text ends.
 */
export class JsonListSplitter {
  private depth = 0;
  private inString = false;
  private escaped = false;
  private inList = false;
  private lastKey = '';
  private keyParts: string[] | null = null;
  private itemParts: string[] | null = null;
  private compound = false;
  private readonly head: string[] = [];

  constructor(private readonly listKey: string) {}

  /** The items completed by this piece of text, in order. */
  feed(text: string): string[] {
    const items: string[] = [];
    let headFrom = this.inList ? -1 : 0;
    let itemFrom = this.itemParts ? 0 : -1;
    let keyFrom = this.keyParts ? 0 : -1;
    const endItem = (to: number) => {
      this.itemParts!.push(text.slice(itemFrom, to));
      items.push(this.itemParts!.join(''));
      this.itemParts = null;
      itemFrom = -1;
    };
    // Inside a string only a quote or a backslash matters: the loop leaps to the next of either.
    let nextQuote = -1;
    let nextBackslash = -1;
    for (let i = 0; i < text.length; i++) {
      if (this.inString) {
        if (this.escaped) {
          this.escaped = false;
          continue;
        }
        if (nextQuote < i) nextQuote = indexOrEnd(text, '"', i);
        if (nextBackslash < i) nextBackslash = indexOrEnd(text, '\\', i);
        i = Math.min(nextQuote, nextBackslash);
        if (i === text.length) break;
        if (i === nextBackslash) this.escaped = true;
        else {
          this.inString = false;
          if (keyFrom >= 0) {
            this.lastKey = this.keyParts!.join('') + text.slice(keyFrom, i);
            this.keyParts = null;
            keyFrom = -1;
          }
        }
        continue;
      }
      const c = text.charCodeAt(i);
      if (this.inList && this.depth === 2 && this.itemParts && !this.compound && (c === 44 || c === 93)) endItem(i);
      if (this.inList && this.depth === 2 && !this.itemParts && c > 32 && c !== 44 && c !== 93) {
        this.itemParts = [];
        itemFrom = i;
        this.compound = c === 123 || c === 91;
      }
      if (c === 34) {
        this.inString = true;
        if (this.depth === 1 && !this.inList) {
          this.keyParts = [];
          keyFrom = i + 1;
        }
      } else if (c === 123 || c === 91) {
        if (c === 91 && this.depth === 1 && this.lastKey === this.listKey) {
          this.inList = true;
          this.head.push(text.slice(headFrom, i + 1));
          headFrom = -1;
        }
        this.depth++;
      } else if (c === 125 || c === 93) {
        this.depth--;
        if (this.inList && this.depth === 2 && this.itemParts && this.compound) endItem(i + 1);
        else if (this.inList && this.depth === 1) {
          this.inList = false;
          headFrom = i;
        }
      }
    }
    if (headFrom >= 0) this.head.push(text.slice(headFrom));
    if (itemFrom >= 0) this.itemParts!.push(text.slice(itemFrom));
    if (keyFrom >= 0) this.keyParts!.push(text.slice(keyFrom));
    return items;
  }

  /** The document without the list's items; JSON.parse it to read the head. */
  rest(): string {
    return this.head.join('');
  }
}
