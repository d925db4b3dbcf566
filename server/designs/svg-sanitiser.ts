import createDOMPurify from 'dompurify';
import { JSDOM } from 'jsdom';

const SVG_NS = 'http://www.w3.org/2000/svg';
const window = new JSDOM('').window;
const purify = createDOMPurify(window as unknown as Parameters<typeof createDOMPurify>[0]);

// External references could fetch from elsewhere when the design is shown; only #fragments stay.
purify.addHook('afterSanitizeAttributes', (node) => {
  for (const name of ['href', 'xlink:href']) {
    const value = node.getAttribute(name);
    if (value !== null && !value.trim().startsWith('#')) node.removeAttribute(name);
  }
  const style = node.getAttribute('style');
  if (style !== null && /url\s*\(|@import|expression\s*\(/i.test(style)) node.removeAttribute('style');
});
purify.addHook('uponSanitizeElement', (node, data) => {
  if (data.tagName === 'style' && /url\s*\(|@import/i.test(node.textContent ?? '')) node.parentNode?.removeChild(node);
});

/** Why an SVG was refused before sanitising. */
export type SvgRefusal = 'not-svg' | 'script';

/**
 * Parses text as XML and checks it is an SVG document with no scripts in it. Scripts, event-handler
 * attributes and javascript: links are refused outright rather than stripped: a design should never
 * carry them, and a person should know the file was unusual.
 */
export function inspectSvg(text: string): SvgRefusal | null {
  let document: Document;
  try {
    document = new JSDOM(text, { contentType: 'image/svg+xml' }).window.document;
  } catch {
    return 'not-svg';
  }
  const root = document.documentElement;
  if (!root || root.localName !== 'svg' || root.namespaceURI !== SVG_NS) return 'not-svg';
  if (document.getElementsByTagNameNS('*', 'script').length > 0) return 'script';
  for (const element of Array.from(document.getElementsByTagName('*'))) {
    for (const attribute of Array.from(element.attributes)) {
      if (/^on/i.test(attribute.localName)) return 'script';
      if (/href$/i.test(attribute.localName) && /^\s*(?:javascript|vbscript|data:text\/html)/i.test(attribute.value)) return 'script';
    }
  }
  return null;
}

/**
 * Cleans an SVG with DOMPurify's SVG profile: no scripts, event handlers or foreignObject, no href
 * other than #fragments, no <style> or style attribute that loads a url() or @import.
 */
export function sanitiseSvg(text: string): string {
  // The HTML parser keeps viewBox's case; an XML declaration or doctype would empty the result, so drop them first.
  const body = text.replace(/^\uFEFF?\s*<\?xml[^>]*\?>/i, '').replace(/<!DOCTYPE[^>[]*(\[[^\]]*\])?\s*>/i, '');
  const clean = purify.sanitize(body, {
    USE_PROFILES: { svg: true, svgFilters: true },
    ADD_TAGS: ['use'], // symbols reused by #fragment are common in exported designs; the hook drops external ones
    FORBID_TAGS: ['script', 'foreignObject', 'iframe', 'embed', 'object'],
    NAMESPACE: SVG_NS,
  });
  return `<?xml version="1.0" encoding="UTF-8"?>\n${String(clean)}`;
}
