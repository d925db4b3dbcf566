/** A 2D affine matrix [a b c d e f] as in SVG: x' = a x + c y + e, y' = b x + d y + f. */
export type Affine = readonly [number, number, number, number, number, number];

export const IDENTITY: Affine = [1, 0, 0, 1, 0, 0];

/** The matrix that applies `inner` first, then `outer`. */
export function compose(outer: Affine, inner: Affine): Affine {
  const [a1, b1, c1, d1, e1, f1] = outer;
  const [a2, b2, c2, d2, e2, f2] = inner;
  return [
    a1 * a2 + c1 * b2,
    b1 * a2 + d1 * b2,
    a1 * c2 + c1 * d2,
    b1 * c2 + d1 * d2,
    a1 * e2 + c1 * f2 + e1,
    b1 * e2 + d1 * f2 + f1,
  ];
}

/** Where a point lands under the matrix. */
export function applyToPoint(m: Affine, x: number, y: number): { x: number; y: number } {
  return { x: m[0] * x + m[2] * y + m[4], y: m[1] * x + m[3] * y + m[5] };
}

/**
 * The factor every length is multiplied by when the matrix is a rotation, uniform scale, reflection
 * and translation (a similarity); undefined when it stretches one direction more than another.
 */
export function uniformScale(m: Affine): number | undefined {
  const [a, b, c, d] = m;
  const columnX = Math.hypot(a, b);
  const columnY = Math.hypot(c, d);
  const sameLength = Math.abs(columnX - columnY) <= 1e-9 * Math.max(columnX, columnY);
  const square = Math.abs(a * c + b * d) <= 1e-9 * columnX * columnY;
  return sameLength && square ? columnX : undefined;
}

/** Reads an SVG transform list (W3C SVG 1.1 section 7.6): matrix, translate, scale, rotate, skewX, skewY. */
export function parseTransformList(text: string | undefined): Affine {
  let result: Affine = IDENTITY;
  if (!text) return result;
  for (const [, kind, argumentText] of text.matchAll(/(matrix|translate|scale|rotate|skewX|skewY)\s*\(([^)]*)\)/g)) {
    const args = (argumentText.match(/[-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?/gi) ?? []).map(Number);
    result = compose(result, transformFor(kind, args));
  }
  return result;
}

function transformFor(kind: string, args: number[]): Affine {
  const radians = (deg: number) => (deg * Math.PI) / 180;
  switch (kind) {
    case 'matrix':
      return args.length >= 6 ? [args[0], args[1], args[2], args[3], args[4], args[5]] : IDENTITY;
    case 'translate':
      return [1, 0, 0, 1, args[0] ?? 0, args[1] ?? 0];
    case 'scale':
      return [args[0] ?? 1, 0, 0, args[1] ?? args[0] ?? 1, 0, 0];
    case 'rotate': {
      const angle = radians(args[0] ?? 0);
      const rotation: Affine = [Math.cos(angle), Math.sin(angle), -Math.sin(angle), Math.cos(angle), 0, 0];
      if (args.length < 3) return rotation;
      const [cx, cy] = [args[1], args[2]];
      return compose(compose([1, 0, 0, 1, cx, cy], rotation), [1, 0, 0, 1, -cx, -cy]);
    }
    case 'skewX':
      return [1, 0, Math.tan(radians(args[0] ?? 0)), 1, 0, 0];
    case 'skewY':
      return [1, Math.tan(radians(args[0] ?? 0)), 0, 1, 0, 0];
    default:
      return IDENTITY;
  }
}
