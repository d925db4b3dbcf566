import { chooseRoll, LEADER_ALLOWANCE_MM, type RackRoll } from '../../src/shared/cutting/roll-choice';
import { deductCut } from '../../src/shared/cutting/roll-deduction';
import { TYPICAL_PRODUCTION_CUTTER } from '../../src/shared/cutting/media-limits';

// Demo rolls (invented numbers): 15 in = 381 mm and 20 in = 508 mm wide, common roll widths
// (common practice, no published source); 1 in = 25.4 mm (NIST SP 811).
function roll(id: number, widthMm: number, remainingMm: number, lengthMm = 22860, filmId = 1): RackRoll {
  return { id, label: `R-${String(id).padStart(3, '0')}`, filmId, widthMm, lengthMm, remainingMm, reorderMm: 3000, rackSlot: `A${id}` };
}

describe('roll choice', () => {
  const need = { filmId: 1, widthNeededMm: 370, lengthUsedMm: 2000 };

  it('prefers the partly used roll with the least left that still holds the cut and its leader', () => {
    const rolls = [roll(1, 381, 22860), roll(2, 381, 9000), roll(3, 508, 2200), roll(4, 381, 2000 + LEADER_ALLOWANCE_MM)];
    const choice = chooseRoll(need, rolls);
    expect(choice.kind === 'roll' && choice.roll.id).toBe(4);
    expect(choice.sentence).toMatch(/Take roll R-004 from rack slot A4/);
  });

  it('takes the narrowest full roll when no partly used roll fits', () => {
    const rolls = [roll(1, 508, 22860), roll(2, 381, 22860), roll(3, 305, 22860), roll(4, 381, 1000)];
    const choice = chooseRoll(need, rolls);
    expect(choice.kind === 'roll' && choice.roll.id).toBe(2);
  });

  it('ignores rolls of another film or colour and rolls the cutter cannot take', () => {
    const rolls = [roll(1, 381, 9000, 22860, 2), roll(2, 660, 9000), roll(3, 508, 22860)];
    const choice = chooseRoll(need, rolls, { name: 'Cutter 1', ...TYPICAL_PRODUCTION_CUTTER });
    expect(choice.kind === 'roll' && choice.roll.id).toBe(3);
  });

  it('says how much is short and suggests two rolls when none holds the cut alone', () => {
    const rolls = [roll(1, 381, 1500), roll(2, 381, 1200)];
    const choice = chooseRoll(need, rolls);
    expect(choice.kind).toBe('split');
    // Needs 2000 + 150 = 2150 mm; the longest has 1500: 650 mm short.
    expect(choice.kind === 'split' && choice.shortMm).toBe(650);
    expect(choice.sentence).toMatch(/0\.65 m .* short\. Split the cut across two rolls, R-001 and R-002/);
  });

  it('says so when not even two rolls together hold the cut', () => {
    const choice = chooseRoll(need, [roll(1, 381, 900), roll(2, 381, 800)]);
    expect(choice.kind).toBe('none');
    expect(choice.sentence).toMatch(/Not even two rolls/);
  });

  it('says so when no roll of the film is on the rack or none is wide enough', () => {
    expect(chooseRoll(need, []).sentence).toBe('No roll of this film and colour is on the rack.');
    expect(chooseRoll(need, [roll(1, 305, 22860)]).sentence).toMatch(/No roll of this film is 370 mm/);
  });
});

describe('deducting a confirmed cut', () => {
  it('takes the cut and the test cut off the roll and flags crossing the reorder length once', () => {
    const first = deductCut({ remainingMm: 3500, reorderMm: 3000 }, 400, 60);
    expect(first).toEqual({ remainingMm: 3040, belowReorder: false, crossedReorder: false, overdrawnMm: 0 });
    const second = deductCut({ remainingMm: first.remainingMm, reorderMm: 3000 }, 100, 0);
    expect(second).toMatchObject({ remainingMm: 2940, belowReorder: true, crossedReorder: true });
    const third = deductCut({ remainingMm: second.remainingMm, reorderMm: 3000 }, 100, 0);
    expect(third).toMatchObject({ remainingMm: 2840, belowReorder: true, crossedReorder: false });
  });

  it('never goes below zero and reports film used beyond what the rack held', () => {
    expect(deductCut({ remainingMm: 300, reorderMm: 3000 }, 350, 20)).toMatchObject({ remainingMm: 0, overdrawnMm: 70 });
  });
});
