import { describeWidth } from './length-units';
import { GangLayoutRefusal } from './gang-layout-refusal';
import type { GangLayoutSettings, PieceGroup, PieceRectangle } from './gang-layout-types';

/** The width across the roll that pieces may occupy: roll width less both edge margins. */
export function usableWidthMm(settings: GangLayoutSettings): number {
  return settings.rollWidthMm - 2 * settings.edgeMarginMm;
}

/** Expands groups into one padded rectangle per piece, refusing any piece that fits neither way round. */
export function pieceRectangles(groups: readonly PieceGroup[], settings: GangLayoutSettings): PieceRectangle[] {
  const usable = usableWidthMm(settings);
  if (!(usable > 0)) {
    throw new GangLayoutRefusal(
      'no-usable-width',
      `A ${describeWidth(settings.rollWidthMm)} roll leaves no usable width after two ${settings.edgeMarginMm} mm edge margins.`,
    );
  }
  const border = settings.weedingBorderMm;
  const rectangles: PieceRectangle[] = [];
  for (const group of groups) {
    if (!(group.designWidthMm > 0 && group.designHeightMm > 0) || !Number.isInteger(group.quantity) || group.quantity < 0) {
      throw new GangLayoutRefusal('bad-input', `"${group.label}" needs a width and height above zero and a whole number of pieces.`);
    }
    const width = group.designWidthMm + 2 * border;
    const height = group.designHeightMm + 2 * border;
    const fitsUpright = width <= usable;
    const fitsTurned = group.mayRotate && height <= usable;
    if (!fitsUpright && !fitsTurned) {
      const turnNote = group.mayRotate ? 'either way round' : 'and it may not be turned';
      throw new GangLayoutRefusal(
        'piece-too-wide',
        `"${group.label}" is ${Math.round(width)} mm by ${Math.round(height)} mm with its weeding border, ` +
          `wider than the ${describeWidth(usable)} usable on this roll ${turnNote}: choose a wider roll or scale the design down.`,
      );
    }
    for (let n = 1; n <= group.quantity; n++) {
      rectangles.push({
        pieceId: `${group.id}#${n}`,
        groupId: group.id,
        label: group.label,
        width,
        height,
        mayRotate: group.mayRotate,
        designAreaMm2: group.designWidthMm * group.designHeightMm,
      });
    }
  }
  return rectangles;
}
