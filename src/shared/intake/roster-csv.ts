import Papa from 'papaparse';
import { SIZES, type RosterLineInput, type Size } from '../intake-contract';

/** What a roster is checked against: the placement's width and the chosen letter height. */
export interface RosterRules {
  placementWidthMm: number;
  letterHeightMm: number;
}

/** One roster row as the preview shows it, with a sentence for each problem. */
export interface RosterPreviewRow {
  /** The record's number in the file (1 = first line, header included), for "line 12: ...". */
  line: number;
  name: string;
  number: string;
  /** The size as Dwell names it when recognised (e.g. "xxl" becomes "2XL"), else as typed. */
  size: string;
  extraText: string;
  errors: string[];
}

/** The parsed roster and its tallies. */
export interface RosterPreview {
  rows: RosterPreviewRow[];
  validCount: number;
  errorCount: number;
}

/**
 * Average width of a capital letter in block lettering, as a share of the letter height.
 * Common practice, no published source: block capitals run about 0.6 to 0.7 of their height; we take 0.65.
 */
export const BLOCK_LETTER_WIDTH_RATIO = 0.65;
/** Gap between letters as a share of the letter height (common practice, no published source). */
export const LETTER_SPACING_RATIO = 0.1;
/** Longest name, number and extra text the hub stores (column widths of roster_lines). */
export const MAX_NAME_CHARS = 40;
export const MAX_EXTRA_TEXT_CHARS = 40;
/** The most rows one roster may hold. */
export const MAX_ROSTER_ROWS = 5000;

const HEADER_ALIASES: Record<string, keyof Pick<RosterPreviewRow, 'name' | 'number' | 'size' | 'extraText'>> = {
  name: 'name',
  'player name': 'name',
  number: 'number',
  no: 'number',
  'no.': 'number',
  '#': 'number',
  size: 'size',
  extra: 'extraText',
  'extra text': 'extraText',
  extratext: 'extraText',
  extra_text: 'extraText',
};

const SIZE_SPELLINGS: Record<string, Size> = {
  SMALL: 'S',
  MEDIUM: 'M',
  MED: 'M',
  LARGE: 'L',
  XLARGE: 'XL',
  EXTRALARGE: 'XL',
  XXL: '2XL',
  XXXL: '3XL',
  XXXXL: '4XL',
  XXXXXL: '5XL',
  XXLARGE: '2XL',
};

/**
 * Dwell's size for what a person typed: case and spaces ignored, "xxl" is 2XL, "youth m", "y-m" and
 * "ym" are YM, "small"/"medium"/"large" are S/M/L. Unknown text gives null.
 */
export function normaliseSize(typed: string): Size | null {
  const compact = typed.toUpperCase().replace(/[\s\-_.]/g, '');
  if (!compact) return null;
  const youth = /^(?:YOUTH|Y)(.+)$/.exec(compact);
  if (youth) {
    const adult = normaliseSize(youth[1]!);
    const candidate = adult ? `Y${adult}` : null;
    return candidate && (SIZES as readonly string[]).includes(candidate) ? (candidate as Size) : null;
  }
  if ((SIZES as readonly string[]).includes(compact)) return compact as Size;
  return SIZE_SPELLINGS[compact] ?? null;
}

/**
 * Estimated width of a name in block capitals: every character (spaces too) takes
 * BLOCK_LETTER_WIDTH_RATIO x height, plus LETTER_SPACING_RATIO x height between neighbours.
 */
export function estimateNameWidthMm(name: string, letterHeightMm: number): number {
  const letters = Array.from(name.trim()).length;
  if (letters === 0) return 0;
  return letters * BLOCK_LETTER_WIDTH_RATIO * letterHeightMm + (letters - 1) * LETTER_SPACING_RATIO * letterHeightMm;
}

/** The most characters that fit the placement width at the letter height, by the estimate above. */
export function maxNameLetters(rules: RosterRules): number {
  const perLetter = (BLOCK_LETTER_WIDTH_RATIO + LETTER_SPACING_RATIO) * rules.letterHeightMm;
  // n letters need n*(w+s) - s; solve n*(w+s) - s <= width for n.
  return Math.max(0, Math.floor((rules.placementWidthMm + LETTER_SPACING_RATIO * rules.letterHeightMm) / perLetter + 1e-9));
}

/** Re-checks one row (after an edit, or on the hub) and normalises its size and number. */
export function validateRosterRow(row: Omit<RosterPreviewRow, 'errors'> & { errors?: string[] }, rules: RosterRules): RosterPreviewRow {
  const name = row.name.trim();
  const extraText = row.extraText.trim();
  const number = row.number.trim().replace(/^#/, '');
  const typedSize = row.size.trim();
  const size = normaliseSize(typedSize);
  const errors: string[] = [];

  if (!typedSize) errors.push('The size is missing. Add one of ' + SIZES.join(', ') + '.');
  else if (!size) errors.push(`"${typedSize}" is not a size Dwell knows. Use one of ${SIZES.join(', ')}.`);

  // A jersey may carry a number and no name, or a name and no number, but not neither.
  if (!name && !number) errors.push('This row has neither a name nor a number. Add one or remove the row.');
  if (number && !/^(?:\d|[1-9]\d|00)$/.test(number)) {
    errors.push(`"${number}" is not a jersey number. Use a whole number from 0 to 99, or 00.`);
  }

  const letters = Array.from(name).length;
  if (letters > MAX_NAME_CHARS) {
    errors.push(`The name has ${letters} characters; Dwell keeps at most ${MAX_NAME_CHARS}. Shorten it.`);
  } else if (name) {
    const widthMm = estimateNameWidthMm(name, rules.letterHeightMm);
    if (widthMm > rules.placementWidthMm) {
      errors.push(
        `"${name}" is about ${Math.round(widthMm)} mm wide at ${rules.letterHeightMm} mm letters, wider than the ` +
          `${rules.placementWidthMm} mm placement (${maxNameLetters(rules)} characters fit). Shorten it or choose smaller letters.`,
      );
    }
  }
  if (Array.from(extraText).length > MAX_EXTRA_TEXT_CHARS) {
    errors.push(`The extra text is longer than ${MAX_EXTRA_TEXT_CHARS} characters. Shorten it.`);
  }

  return { line: row.line, name, number, size: size ?? typedSize, extraText, errors };
}

/** Counts valid rows and rows with errors. */
export function tallyRoster(rows: RosterPreviewRow[]): RosterPreview {
  const errorCount = rows.filter((row) => row.errors.length > 0).length;
  return { rows, validCount: rows.length - errorCount, errorCount };
}

/** Applies a person's fix to one row of the preview and re-checks it; other rows are untouched. */
export function editRosterRow(
  preview: RosterPreview,
  index: number,
  patch: Partial<Pick<RosterPreviewRow, 'name' | 'number' | 'size' | 'extraText'>>,
  rules: RosterRules,
): RosterPreview {
  const current = preview.rows[index];
  if (!current) return preview;
  const rows = preview.rows.slice();
  rows[index] = validateRosterRow({ ...current, ...patch }, rules);
  return tallyRoster(rows);
}

/** Removes one row from the preview. */
export function removeRosterRow(preview: RosterPreview, index: number): RosterPreview {
  return tallyRoster(preview.rows.filter((_, i) => i !== index));
}

/** The rows ready to send to the hub (only call when errorCount is 0; rows with errors are left out). */
export function toRosterLineInputs(rows: RosterPreviewRow[]): RosterLineInput[] {
  return rows
    .filter((row) => row.errors.length === 0)
    .map((row) => ({ name: row.name, number: row.number, size: row.size as Size, extraText: row.extraText }));
}

type Column = 'name' | 'number' | 'size' | 'extraText';
const DEFAULT_COLUMNS: Column[] = ['name', 'number', 'size', 'extraText'];

function headerColumns(cells: string[]): (Column | null)[] | null {
  const mapped = cells.map((cell) => HEADER_ALIASES[cell.trim().toLowerCase()] ?? null);
  return mapped.includes('name') || mapped.includes('size') || mapped.includes('number') ? mapped : null;
}

/**
 * Parses a roster CSV: UTF-8 (a BOM is dropped), commas, quotes, CRLF or LF, empty lines skipped.
 * A first row naming name/number/size/extra (any case, any order) is a header; otherwise columns are
 * name, number, size, extra in that order. Each row is checked with validateRosterRow.
 */
export function parseRosterCsv(text: string, rules: RosterRules): RosterPreview {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: false, header: false });
  const records = parsed.data;
  let columns: (Column | null)[] = DEFAULT_COLUMNS;
  let start = 0;
  const firstIndex = records.findIndex((cells) => cells.some((cell) => cell.trim() !== ''));
  if (firstIndex >= 0) {
    const header = headerColumns(records[firstIndex]!);
    if (header) {
      columns = header;
      start = firstIndex + 1;
    }
  }
  const rows: RosterPreviewRow[] = [];
  for (let i = start; i < records.length; i++) {
    const cells = records[i]!;
    if (cells.every((cell) => cell.trim() === '')) continue;
    const row = { line: i + 1, name: '', number: '', size: '', extraText: '' };
    cells.forEach((cell, c) => {
      const column = columns[c];
      if (column) row[column] = cell;
    });
    rows.push(validateRosterRow(row, rules));
  }
  return tallyRoster(rows);
}
