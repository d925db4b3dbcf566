import { ChangeDetectionStrategy, Component, computed, effect, inject, input, model, signal, untracked } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import {
  RosterPreview,
  RosterPreviewRow,
  RosterRules,
  editRosterRow,
  parseRosterCsv,
  removeRosterRow,
  tallyRoster,
  validateRosterRow,
} from '../../shared/intake/roster-csv';
import { READ_FILE_TEXT } from './file-text';
import { inchesFromMm, mmFromInches } from './order-display';

/** Names on a back are commonly lettered 2 in tall (common practice, no published source). */
const DEFAULT_LETTER_HEIGHT_IN = 2;
/** The largest roster file read in the browser; a team roster is a few kilobytes. */
const MAX_ROSTER_BYTES = 1_000_000;

type EditableField = 'name' | 'number' | 'size' | 'extraText';

/** Roster import: reads a CSV in the browser, previews every row with its problems, and lets the lead fix them in place. */
@Component({
  selector: 'dw-roster-import',
  imports: [MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule],
  templateUrl: './roster-import.html',
  styleUrl: './roster-import.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RosterImport {
  private readonly readFileText = inject(READ_FILE_TEXT);

  /** How wide the names may run, from the job's placement. */
  readonly placementWidthMm = input.required<number>();
  /** The checked roster; null until a file is read. */
  readonly preview = model<RosterPreview | null>(null);

  protected readonly letterHeightIn = signal(DEFAULT_LETTER_HEIGHT_IN);
  protected readonly letterHeightMm = computed(() => Math.round(mmFromInches(this.letterHeightIn()) * 10) / 10);
  protected readonly fileName = signal<string | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly letterProblem = signal<string | null>(null);
  /** Lines that had a problem when read stay editable, so a fixed row does not jump away mid-edit. */
  protected readonly editableLines = signal<ReadonlySet<number>>(new Set());
  protected readonly widthInches = computed(() => inchesFromMm(this.placementWidthMm()).toFixed(1));

  private readonly rules = computed<RosterRules>(() => ({
    placementWidthMm: this.placementWidthMm(),
    letterHeightMm: this.letterHeightMm(),
  }));

  constructor() {
    // New rules (letter height, placement) re-check every row already read.
    effect(() => {
      const rules = this.rules();
      const current = untracked(this.preview);
      if (!current) return;
      const rows = current.rows.map((row) => validateRosterRow(row, rules));
      untracked(() => {
        this.markEditable(rows);
        this.preview.set(tallyRoster(rows));
      });
    });
  }

  protected async fileChosen(input: HTMLInputElement): Promise<void> {
    const file = input.files?.[0];
    input.value = '';
    if (!file) return;
    this.problem.set(null);
    if (file.size > MAX_ROSTER_BYTES) {
      this.problem.set(`${file.name} is larger than 1 MB. A roster is a CSV file of names, numbers and sizes.`);
      return;
    }
    try {
      const text = await this.readFileText(file);
      const preview = parseRosterCsv(text, this.rules());
      if (preview.rows.length === 0) {
        this.problem.set(`${file.name} has no rows. Each row needs a name or number and a size.`);
        return;
      }
      this.fileName.set(file.name);
      this.editableLines.set(new Set());
      this.markEditable(preview.rows);
      this.preview.set(preview);
    } catch {
      this.problem.set(`${file.name} could not be read. Save it as a CSV file and try again.`);
    }
  }

  protected letterHeightTyped(text: string): void {
    const inches = Number(text);
    if (!text.trim() || !(inches > 0) || inches > 12) {
      this.letterProblem.set('Enter a letter height between 0.25 and 12 inches.');
      return;
    }
    this.letterProblem.set(null);
    this.letterHeightIn.set(inches);
  }

  protected rowEdited(index: number, field: EditableField, value: string): void {
    const current = this.preview();
    if (!current) return;
    this.preview.set(editRosterRow(current, index, { [field]: value }, this.rules()));
  }

  protected rowRemoved(index: number): void {
    const current = this.preview();
    if (current) this.preview.set(removeRosterRow(current, index));
  }

  protected isEditable(row: RosterPreviewRow): boolean {
    return this.editableLines().has(row.line);
  }

  private markEditable(rows: RosterPreviewRow[]): void {
    const bad = rows.filter((row) => row.errors.length > 0).map((row) => row.line);
    if (bad.length) this.editableLines.update((lines) => new Set([...lines, ...bad]));
  }
}
