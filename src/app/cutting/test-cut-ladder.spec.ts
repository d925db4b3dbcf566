import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import type { TestCutRung } from '../../shared/cutting/test-cut';
import { TestCutLadder } from './test-cut-ladder';

describe('TestCutLadder', () => {
  let fixture: ComponentFixture<TestCutLadder>;
  let recorded: TestCutRung[][];
  const element = () => fixture.nativeElement as HTMLElement;

  beforeEach(async () => {
    TestBed.configureTestingModule({ imports: [TestCutLadder], providers: [provideZonelessChangeDetection()] });
    fixture = TestBed.createComponent(TestCutLadder);
    // The ladder brackets the 90 g preset one 10 g step either side (common practice, no published source).
    fixture.componentRef.setInput('forces', [80, 90, 100]);
    fixture.componentRef.setInput('presetG', 90);
    recorded = [];
    fixture.componentInstance.recorded.subscribe((rungs) => recorded.push(rungs));
    await fixture.whenStable();
  });

  it('shows three large tiles, lightest first, with the preset marked', () => {
    const tiles = [...element().querySelectorAll<HTMLButtonElement>('.tile')];
    expect(tiles.map((t) => t.querySelector('.force')!.textContent!.trim())).toEqual(['80 g', '90 g', '100 g']);
    expect(tiles.map((t) => t.classList.contains('preset'))).toEqual([false, true, false]);
  });

  it('records the tapped force as clean and the lighter ones as not clean', () => {
    element().querySelector<HTMLButtonElement>('[data-testid="ladder-90"]')!.click();
    expect(recorded).toEqual([
      [
        { forceG: 80, cutClean: false, weededClean: false },
        { forceG: 90, cutClean: true, weededClean: true },
      ],
    ]);
  });

  it('records every force as not clean when none came clean', () => {
    element().querySelector<HTMLButtonElement>('[data-testid="ladder-none"]')!.click();
    expect(recorded[0]!.every((r) => !r.cutClean && !r.weededClean)).toBe(true);
    expect(recorded[0]!.map((r) => r.forceG)).toEqual([80, 90, 100]);
  });

  it('takes no taps while disabled', async () => {
    fixture.componentRef.setInput('disabled', true);
    await fixture.whenStable();
    element().querySelector<HTMLButtonElement>('[data-testid="ladder-100"]')!.click();
    expect(recorded).toEqual([]);
  });
});
