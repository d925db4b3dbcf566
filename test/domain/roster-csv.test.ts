import { editRosterRow, estimateNameWidthMm, maxNameLetters, normaliseSize, parseRosterCsv } from '../../src/shared/intake/roster-csv';

// A full-back placement of 280 mm with 50 mm letters (invented demo numbers for the checks below).
const rules = { placementWidthMm: 280, letterHeightMm: 50 };

describe('reading a roster CSV', () => {
  it('reads a header row in any case and any column order', () => {
    const { rows, validCount } = parseRosterCsv('SIZE,Name,Number\nM,Ana,7\nL,Bo,00\n', rules);
    expect(validCount).toBe(2);
    expect(rows.map((r) => [r.name, r.number, r.size])).toEqual([['Ana', '7', 'M'], ['Bo', '00', 'L']]);
  });

  it('reads name, number, size, extra in that order when there is no header', () => {
    const { rows } = parseRosterCsv('Ana,7,M,Captain\n', rules);
    expect(rows[0]).toMatchObject({ line: 1, name: 'Ana', number: '7', size: 'M', extraText: 'Captain', errors: [] });
  });

  it('keeps UTF-8 accents, quoted commas, and drops a BOM, CRLF and empty lines', () => {
    const text = '\uFEFFname,number,size,extra\r\n"Zoë Marchetti",7,YM,"Captain, U12"\r\n\r\nMateus Ólafsson,00,YL,\r\n   \r\n';
    const { rows, errorCount } = parseRosterCsv(text, { placementWidthMm: 1000, letterHeightMm: 50 });
    expect(errorCount).toBe(0);
    expect(rows.map((r) => r.name)).toEqual(['Zoë Marchetti', 'Mateus Ólafsson']);
    expect(rows[0]!.extraText).toBe('Captain, U12');
    expect(rows.map((r) => r.line)).toEqual([2, 4]);
  });

  it('reads 5,000 rows', () => {
    const text = ['name,number,size', ...Array.from({ length: 5000 }, (_, i) => `Player ${i},${i % 100},${['S', 'M', 'L'][i % 3]}`)].join('\n');
    const preview = parseRosterCsv(text, { placementWidthMm: 1000, letterHeightMm: 30 });
    expect(preview.rows).toHaveLength(5000);
    expect(preview.validCount).toBe(5000);
    expect(preview.rows[4999]).toMatchObject({ line: 5001, name: 'Player 4999', number: '99', size: 'M' });
  });

  it('accepts common size spellings and says which it made of them', () => {
    expect(['xxl', 'Youth M', 'y-s', 'small', ' xl ', 'XXXL'].map(normaliseSize)).toEqual(['2XL', 'YM', 'YS', 'S', 'XL', '3XL']);
    expect(normaliseSize('huge')).toBeNull();
  });

  it('gives each bad row a sentence: missing size, unknown size, bad number, empty row', () => {
    const { rows, errorCount, validCount } = parseRosterCsv('Ana,7,\nBo,7,XXXXXXL\nCy,100,M\nDi,7a,M\n,,M\nEd,,M\n', rules);
    expect(errorCount).toBe(5);
    expect(validCount).toBe(1); // a jersey without a number is allowed
    expect(rows[0]!.errors).toEqual([expect.stringMatching(/^The size is missing\. Add one of YXS/)]);
    expect(rows[1]!.errors).toEqual([expect.stringMatching(/"XXXXXXL" is not a size Dwell knows/)]);
    expect(rows[2]!.errors).toEqual(['"100" is not a jersey number. Use a whole number from 0 to 99, or 00.']);
    expect(rows[3]!.errors).toEqual(['"7a" is not a jersey number. Use a whole number from 0 to 99, or 00.']);
    expect(rows[4]!.errors).toEqual(['This row has neither a name nor a number. Add one or remove the row.']);
  });

  it('refuses a name wider than the placement at the letter height', () => {
    // Common practice, no published source: block capitals ~0.65 x height wide, spacing 0.1 x height.
    // At 50 mm letters: n letters take n*32.5 + (n-1)*5 mm. 7 letters: 227.5 + 30 = 257.5 mm <= 280;
    // 8 letters: 260 + 35 = 295 mm > 280. So 7 fit and "PENHALIG" (8) does not.
    expect(estimateNameWidthMm('PENHALI', 50)).toBeCloseTo(257.5, 6);
    expect(estimateNameWidthMm('PENHALIG', 50)).toBeCloseTo(295, 6);
    expect(maxNameLetters(rules)).toBe(7);
    const { rows } = parseRosterCsv('PENHALI,5,M\nPENHALIG,5,M\n', rules);
    expect(rows[0]!.errors).toEqual([]);
    expect(rows[1]!.errors).toEqual([
      '"PENHALIG" is about 295 mm wide at 50 mm letters, wider than the 280 mm placement (7 characters fit). Shorten it or choose smaller letters.',
    ]);
  });

  it('re-checks a row the person fixed and updates the tallies', () => {
    const preview = parseRosterCsv('Ana,7,\nBo,8,M\n', rules);
    expect(preview.errorCount).toBe(1);
    const fixed = editRosterRow(preview, 0, { size: 'youth l' }, rules);
    expect(fixed.rows[0]).toMatchObject({ size: 'YL', errors: [] });
    expect(fixed).toMatchObject({ validCount: 2, errorCount: 0 });
    expect(preview.rows[0]!.errors).toHaveLength(1); // the earlier preview is unchanged
  });
});
