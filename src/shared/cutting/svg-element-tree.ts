/** An SVG element as the cut estimate needs it: name, attributes and children. */
export interface SvgElement {
  name: string;
  attributes: Record<string, string>;
  children: SvgElement[];
}

// Why our own reader: designs reach Dwell through the hub's sanitiser as well-formed XML, and the
// estimate must run the same way in the hub (no DOM) and in the browser. Element names, attributes
// and nesting are all it needs, so a small tolerant reader beats pulling a DOM into the hub.
const TOKEN = /<!--[\s\S]*?-->|<!\[CDATA\[[\s\S]*?\]\]>|<\?[\s\S]*?\?>|<!DOCTYPE[^>[]*(?:\[[\s\S]*?\])?\s*>|<\/\s*([\w:.-]+)\s*>|<([\w:.-]+)((?:\s+[\w:.-]+\s*=\s*(?:"[^"]*"|'[^']*'))*)\s*(\/?)>/gi;
const ATTRIBUTE = /([\w:.-]+)\s*=\s*(?:"([^"]*)"|'([^']*)')/g;

/** Reads SVG markup into an element tree; text, comments and processing instructions are skipped. */
export function readSvgElements(markup: string): SvgElement {
  const root: SvgElement = { name: '#document', attributes: {}, children: [] };
  const open: SvgElement[] = [root];
  for (const match of markup.matchAll(TOKEN)) {
    const [, closingName, openingName, attributeText, selfClosing] = match;
    if (closingName) {
      // Tolerant: close up to the matching element, ignore a stray closing tag.
      const index = findLastIndex(open, (e) => e.name === localName(closingName));
      if (index > 0) open.length = index;
    } else if (openingName) {
      const element: SvgElement = { name: localName(openingName), attributes: readAttributes(attributeText ?? ''), children: [] };
      open[open.length - 1].children.push(element);
      if (!selfClosing) open.push(element);
    }
  }
  return root;
}

function readAttributes(text: string): Record<string, string> {
  const attributes: Record<string, string> = {};
  for (const [, name, doubleQuoted, singleQuoted] of text.matchAll(ATTRIBUTE)) {
    attributes[localName(name)] = decodeEntities(doubleQuoted ?? singleQuoted ?? '');
  }
  return attributes;
}

/** "svg:path" and "xlink:href" become "path" and "href": Dwell reads no other namespaces. */
function localName(name: string): string {
  const colon = name.lastIndexOf(':');
  return colon >= 0 ? name.slice(colon + 1) : name;
}

function decodeEntities(text: string): string {
  return text
    .replace(/&#x([0-9a-f]+);/gi, (_, hex: string) => String.fromCodePoint(parseInt(hex, 16)))
    .replace(/&#(\d+);/g, (_, dec: string) => String.fromCodePoint(parseInt(dec, 10)))
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&apos;/g, "'")
    .replace(/&amp;/g, '&');
}

function findLastIndex<T>(items: readonly T[], test: (item: T) => boolean): number {
  for (let i = items.length - 1; i >= 0; i--) if (test(items[i])) return i;
  return -1;
}
