import { fromBuffer } from 'file-type';
import type { DesignUpload } from '../../src/shared/intake-contract';
import { pngSizeMm, pngPixelSize, svgSizeMm } from '../../src/shared/intake/design-size';
import { HttpError, badRequest } from '../http/http-error';
import { designUrl } from '../jobs/job-view';
import type { DesignStore } from './design-store';
import { inspectSvg, sanitiseSvg } from './svg-sanitiser';

/** The largest design file the hub takes: plenty for a cut-ready SVG or a print PNG. */
export const MAX_DESIGN_BYTES = 5 * 1024 * 1024;

const unsupported = (what: string) =>
  new HttpError(415, `This file is ${what}, not an SVG or PNG design. Export the design as SVG or PNG and upload that.`);

/**
 * Checks an uploaded design by its bytes (never its name), sanitises an SVG, stores it under a random
 * name and reads its size. Refuses empty files, other file types and SVGs with scripts, with sentences.
 */
export async function acceptDesign(bytes: Buffer, store: DesignStore): Promise<DesignUpload> {
  if (bytes.length === 0) throw badRequest('The file is empty (0 bytes). Choose the design file again.');
  const detected = await fromBuffer(bytes);
  if (detected?.mime === 'image/png') {
    if (!pngPixelSize(bytes)) throw unsupported('a damaged PNG');
    const file = await store.save(bytes, 'png');
    const size = pngSizeMm(bytes);
    return { file, mime: 'image/png', url: designUrl(file), widthMm: size?.widthMm ?? null, heightMm: size?.heightMm ?? null };
  }
  // XML has no magic number, so an SVG is what file-type cannot name and what parses as <svg>.
  if (detected && detected.mime !== 'application/xml') throw unsupported(`a ${detected.ext.toUpperCase()} file (${detected.mime})`);
  const text = new TextDecoder('utf-8', { fatal: false }).decode(bytes);
  const refusal = inspectSvg(text);
  if (refusal === 'not-svg') throw unsupported('not an SVG drawing (it does not parse as XML with an <svg> root)');
  if (refusal === 'script') {
    throw badRequest('This SVG contains a script or event handler, which a design never needs. Export it again without scripts (plain shapes and text only).');
  }
  const clean = sanitiseSvg(text);
  if (!/<svg[\s>]/.test(clean)) throw unsupported('an SVG with nothing left to draw once cleaned');
  const file = await store.save(new TextEncoder().encode(clean), 'svg');
  const size = svgSizeMm(clean);
  return { file, mime: 'image/svg+xml', url: designUrl(file), widthMm: size?.widthMm ?? null, heightMm: size?.heightMm ?? null };
}
