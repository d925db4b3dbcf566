import { nextWallScale, WALL_MIN_SCALE } from './wall-fit';

describe('nextWallScale', () => {
  it('makes the type smaller in proportion when a view runs past the bottom of the screen', () => {
    expect(nextWallScale(1, 1250, 1000)).toBe(0.8);
    expect(nextWallScale(0.9, 1010, 1000)).toBe(0.89);
  });

  it('never goes below the smallest scale that still reads across a room', () => {
    expect(nextWallScale(1, 3000, 1000)).toBe(WALL_MIN_SCALE);
    expect(nextWallScale(WALL_MIN_SCALE, 2000, 1000)).toBe(WALL_MIN_SCALE);
  });

  it('grows back towards full size only when the view has clear room to spare', () => {
    expect(nextWallScale(0.8, 800, 1000)).toBe(0.94);
    expect(nextWallScale(0.7, 400, 1000)).toBe(1);
    expect(nextWallScale(1, 400, 1000)).toBe(1);
  });

  it('holds its size when the view fits with only a little room left', () => {
    expect(nextWallScale(0.88, 950, 1000)).toBe(0.88);
    expect(nextWallScale(0.88, 1000, 1000)).toBe(0.88);
  });

  it('does nothing before the view is laid out', () => {
    expect(nextWallScale(0.94, 0, 0)).toBe(0.94);
    expect(nextWallScale(1, 1200, 0)).toBe(1);
  });

  it('settles on one size that fits instead of flipping, even when part of the view does not scale', () => {
    // A view with 300 px that keep their size (gaps, chart fonts) and 880 px that follow the type.
    const box = 1000;
    const height = (scale: number) => 300 + 880 * scale;
    let scale = 1;
    const seen: number[] = [];
    for (let render = 0; render < 20; render += 1) {
      scale = nextWallScale(scale, height(scale), box);
      seen.push(scale);
    }

    expect(height(scale)).toBeLessThanOrEqual(box);
    expect(height(scale)).toBeGreaterThan(box * 0.9);
    expect(new Set(seen.slice(-15)).size).toBe(1);
  });
});
