import { measurePathData } from '../../src/shared/cutting/contour-length';
import { IDENTITY } from '../../src/shared/cutting/affine-transform';
import {
  estimateCut,
  LIFT_AND_MOVE_S_PER_CONTOUR,
  OVERCUT_PER_CLOSED_CONTOUR_MM,
  WEAR_FACTOR_BY_CLASS,
} from '../../src/shared/cutting/cut-estimate';

const smoothFilm = { wearClass: 1 as const, cutSpeedMmS: 100 };

/** A design drawn in millimetres: 1 user unit = 1 mm. */
function mmDesign(body: string, size = 200): string {
  return `<?xml version="1.0"?><svg xmlns="http://www.w3.org/2000/svg" width="${size}mm" height="${size}mm" viewBox="0 0 ${size} ${size}">${body}</svg>`;
}

function expectWithinPermille(actual: number, expected: number): void {
  expect(Math.abs(actual - expected) / expected).toBeLessThan(0.001);
}

describe('cut path length', () => {
  it('measures a circle as 2 pi r', () => {
    // Circumference of a circle, 2 pi r, worked by hand: r = 40 mm -> 251.327 mm.
    const estimate = estimateCut(mmDesign('<circle cx="100" cy="100" r="40"/>'), smoothFilm);
    expectWithinPermille(estimate.pathLengthMm, 2 * Math.PI * 40);
    expect(estimate.closedContours).toBe(1);
  });

  it('measures a rectangle as twice width plus height', () => {
    // Worked by hand: 2 x (120 + 35) = 310 mm.
    const estimate = estimateCut(mmDesign('<rect x="10" y="20" width="120" height="35"/>'), smoothFilm);
    expect(estimate.pathLengthMm).toBeCloseTo(310, 6);
  });

  it('measures a rounded rectangle as straight sides plus one ellipse of the corner radii', () => {
    // Worked by hand: straights 2 x (100 - 20) + 2 x (60 - 20) = 240; four quarter circles of r 10 = 20 pi.
    const estimate = estimateCut(mmDesign('<rect x="0" y="0" width="100" height="60" rx="10"/>'), smoothFilm);
    expectWithinPermille(estimate.pathLengthMm, 240 + 20 * Math.PI);
  });

  it('measures the W3C three-quarter arc example as two radii plus three quarters of the circle', () => {
    // W3C SVG 1.1, section 8.3.8, example arcs01, first path (recalled from memory): h -150, a 150 arc
    // with the large-arc flag around (300,200), then z: 150 + (3/4)(2 pi 150) + 150.
    const measure = measurePathData('M300,200 h-150 a150,150 0 1,0 150,-150 z', IDENTITY);
    expectWithinPermille(measure.lengthMm, 300 + 225 * Math.PI);
    expect(measure.closedContours).toBe(1);
  });

  it('measures the W3C quarter arc example as two radii plus a quarter of the circle', () => {
    // W3C SVG 1.1, section 8.3.8, example arcs01, second path (recalled from memory): 150 + (1/4)(2 pi 150) + 150.
    const measure = measurePathData('M275,175 v-150 a150,150 0 0,0 -150,150 z', IDENTITY);
    expectWithinPermille(measure.lengthMm, 300 + 75 * Math.PI);
  });

  it('scales up arc radii too small to reach the end point into a half circle', () => {
    // W3C SVG 1.1, section 8.3.8, example arcs01, third path's first arc (from memory), and appendix F.6.6
    // (out-of-range radii are scaled up): a chord of sqrt(50^2 + 25^2) with r = 25 becomes a semicircle
    // on that chord, so the arc is pi x chord / 2 after the 55.9 mm line.
    const chord = Math.hypot(50, 25);
    const measure = measurePathData('M600,350 l 50,-25 a25,25 -30 0,1 50,-25', IDENTITY);
    expectWithinPermille(measure.lengthMm, chord + (Math.PI * chord) / 2);
    expect(measure.openContours).toBe(1);
  });

  it('measures a semicircle arc as pi r', () => {
    // A r r 0 0 1 across a diameter: half of 2 pi r, worked by hand.
    const measure = measurePathData('M 0 0 A 30 30 0 0 1 60 0', IDENTITY);
    expectWithinPermille(measure.lengthMm, Math.PI * 30);
  });

  it('doubles the length inside a group scaled by 2', () => {
    const plain = estimateCut(mmDesign('<path d="M 10 10 L 50 10 L 50 40 Z"/>'), smoothFilm);
    const scaled = estimateCut(mmDesign('<g transform="scale(2)"><path d="M 10 10 L 50 10 L 50 40 Z"/></g>'), smoothFilm);
    // 3-4-5 triangle (40, 30, 50) = 120 mm, doubled = 240 mm: worked by hand.
    expect(plain.pathLengthMm).toBeCloseTo(120, 6);
    expect(scaled.pathLengthMm).toBeCloseTo(240, 6);
  });

  it('keeps the length under translate, rotate and a composed matrix of a rotation', () => {
    const angle = (30 * Math.PI) / 180;
    const matrix = `matrix(${Math.cos(angle)} ${Math.sin(angle)} ${-Math.sin(angle)} ${Math.cos(angle)} 5 7)`;
    const body = `<g transform="translate(20 30) rotate(45 10 10)"><g transform="${matrix}"><circle cx="0" cy="0" r="25"/></g></g>`;
    expectWithinPermille(estimateCut(mmDesign(body), smoothFilm).pathLengthMm, 2 * Math.PI * 25);
  });

  it('measures a circle stretched by an uneven scale as an ellipse, sampling its points', () => {
    // A circle r = 10 under scale(3, 1) is an ellipse with semi-axes 30 and 10. Ramanujan's second
    // approximation for an ellipse's perimeter (S. Ramanujan, 1914), far below 0.1% error at this ratio:
    // pi (a + b)(1 + 3h / (10 + sqrt(4 - 3h))), h = ((a - b)/(a + b))^2.
    const [a, b] = [30, 10];
    const h = ((a - b) / (a + b)) ** 2;
    const ramanujan = Math.PI * (a + b) * (1 + (3 * h) / (10 + Math.sqrt(4 - 3 * h)));
    const estimate = estimateCut(mmDesign('<g transform="scale(3 1)"><circle cx="20" cy="50" r="10"/></g>'), smoothFilm);
    expectWithinPermille(estimate.pathLengthMm, ramanujan);
    expect(estimate.warnings.join(' ')).toMatch(/stretched unevenly/);
  });

  it('turns viewBox units into millimetres from the width and height', () => {
    // 4 in wide over a 400-unit viewBox: 1 unit = 0.254 mm (1 in = 25.4 mm, NIST SP 811). A 100-unit
    // square is 400 units round = 101.6 mm.
    const svg = '<svg xmlns="http://www.w3.org/2000/svg" width="4in" height="4in" viewBox="0 0 400 400"><rect x="0" y="0" width="100" height="100"/></svg>';
    expect(estimateCut(svg, smoothFilm).pathLengthMm).toBeCloseTo(101.6, 6);
  });

  it('reads pixel sizes at 96 to the inch', () => {
    // CSS Values and Units Level 3, section 5.2: 96 px = 1 in = 25.4 mm. A 96 x 96 px square is 4 in round.
    const svg = '<svg width="200px" height="200px" viewBox="0 0 200 200"><rect width="96" height="96"/></svg>';
    expect(estimateCut(svg, smoothFilm).pathLengthMm).toBeCloseTo(4 * 25.4, 6);
  });

  it('converts lines, polylines, polygons and ellipses, counting only closed shapes as closed', () => {
    const body =
      '<line x1="0" y1="0" x2="30" y2="40"/>' + // 50 (3-4-5)
      '<polyline points="0,0 10,0 10,10"/>' + // 20
      '<polygon points="0,0 40,0 40,30"/>' + // 40 + 30 + 50 = 120
      '<ellipse cx="50" cy="50" rx="20" ry="20"/>'; // 40 pi
    const estimate = estimateCut(mmDesign(body), smoothFilm);
    expectWithinPermille(estimate.pathLengthMm, 50 + 20 + 120 + 40 * Math.PI);
    expect(estimate.closedContours).toBe(2);
    expect(estimate.openContours).toBe(2);
  });

  it('skips definitions and warns about text that was not converted to outlines', () => {
    const body = '<defs><rect width="500" height="500"/></defs><text x="0" y="10">NAME</text><rect width="10" height="10"/>';
    const estimate = estimateCut(mmDesign(body), smoothFilm);
    expect(estimate.pathLengthMm).toBeCloseTo(40, 6);
    expect(estimate.warnings.join(' ')).toMatch(/convert text to outlines/);
  });

  it('adds overcut per closed contour, lift time per contour and wear-weighted blade distance', () => {
    // Two closed squares of 40 mm and one open 50 mm line on a wear-class-3 film at 50 mm/s.
    const body = '<rect width="10" height="10"/><rect x="20" width="10" height="10"/><line x1="0" y1="50" x2="50" y2="50"/>';
    const film = { wearClass: 3 as const, cutSpeedMmS: 50 };
    const estimate = estimateCut(mmDesign(body), film, 2);
    const cutLength = 2 * (130 + 2 * OVERCUT_PER_CLOSED_CONTOUR_MM);
    expect(estimate.cutLengthMm).toBeCloseTo(cutLength, 6);
    expect(estimate.cutTimeS).toBeCloseTo(cutLength / 50 + 6 * LIFT_AND_MOVE_S_PER_CONTOUR, 6);
    expect(estimate.bladeDistanceMm).toBeCloseTo(cutLength * WEAR_FACTOR_BY_CLASS[3], 6);
    expect(WEAR_FACTOR_BY_CLASS[4]).toBeGreaterThan(WEAR_FACTOR_BY_CLASS[1]);
  });

  it('counts each closed subpath of a compound path, such as a letter with a counter', () => {
    const estimate = estimateCut(mmDesign('<path d="M0 0 H30 V30 H0 Z M10 10 H20 V20 H10 Z M40 0 L50 0"/>'), smoothFilm);
    expect(estimate.closedContours).toBe(2);
    expect(estimate.openContours).toBe(1);
    expect(estimate.pathLengthMm).toBeCloseTo(120 + 40 + 10, 6);
  });
});
