import { describeWidth, inchesToMm } from './length-units';

/** What a cutter can take (from the cutters table), in mm. */
export interface CutterMedia {
  name: string;
  carriageWidthMm: number;
  minMediaMm: number;
  maxMediaMm: number;
}

/**
 * A typical production cutter for the demo and for forms' first values: a 24 inch carriage taking
 * media from 12 inch sheets to 20 inch rolls (common practice, no published source).
 */
export const TYPICAL_PRODUCTION_CUTTER: Omit<CutterMedia, 'name'> = {
  carriageWidthMm: inchesToMm(24),
  minMediaMm: inchesToMm(12),
  maxMediaMm: inchesToMm(20),
};

/** Whether a cutter takes media of this width, and if not, a sentence saying why. */
export type MediaCheck = { fits: true } | { fits: false; reason: 'too-narrow' | 'too-wide'; sentence: string };

/** Checks a roll or sheet width against the cutter's narrowest and widest media. */
export function checkMediaWidth(cutter: CutterMedia, mediaWidthMm: number): MediaCheck {
  // A cutter's widest media can never exceed its carriage, whatever was typed in.
  const widest = Math.min(cutter.maxMediaMm, cutter.carriageWidthMm);
  if (mediaWidthMm < cutter.minMediaMm) {
    return {
      fits: false,
      reason: 'too-narrow',
      sentence: `${cutter.name} takes media from ${describeWidth(cutter.minMediaMm)} wide; this ${describeWidth(mediaWidthMm)} roll is too narrow for its pinch rollers.`,
    };
  }
  if (mediaWidthMm > widest) {
    return {
      fits: false,
      reason: 'too-wide',
      sentence: `${cutter.name} takes media up to ${describeWidth(widest)} wide; this ${describeWidth(mediaWidthMm)} roll is too wide for it.`,
    };
  }
  return { fits: true };
}
