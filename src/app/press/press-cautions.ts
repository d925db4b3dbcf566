import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { PRESS_CAUTIONS } from '../../shared/press/cautions';

/** One caution as the band draws it: an icon, a short head and the rest of the sentence. */
interface CautionLine {
  icon: string;
  head: string;
  rest: string;
}

/** The icon for a caution, by what it warns of; anything else gets the workplace-rules shield. */
function cautionIcon(text: string): string {
  if (/hot|burn/i.test(text)) return 'caution-hot';
  if (/pinch|finger/i.test(text)) return 'caution-pinch';
  if (/fume|ventilat/i.test(text)) return 'caution-fumes';
  return 'caution-rules';
}

/** The safety band: the press cautions, always on screen, with icons. */
@Component({
  selector: 'dw-press-cautions',
  imports: [MatIconModule],
  template: `
    <aside class="band" aria-label="Safety" data-testid="press-cautions">
      @for (line of lines(); track $index) {
        <p class="caution">
          <mat-icon [svgIcon]="line.icon" aria-hidden="true" />
          <span><strong>{{ line.head }}</strong>{{ line.rest }}</span>
        </p>
      }
    </aside>
  `,
  styleUrl: './press-cautions.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PressCautions {
  /** The card's cautions; the standard press cautions when there is no card yet. */
  readonly cautions = input<readonly string[]>(PRESS_CAUTIONS);

  protected readonly lines = computed<CautionLine[]>(() =>
    (this.cautions().length ? this.cautions() : PRESS_CAUTIONS).map((text) => {
      const colon = text.indexOf(':');
      return colon > 0 && colon < 40
        ? { icon: cautionIcon(text), head: text.slice(0, colon + 1), rest: text.slice(colon + 1) }
        : { icon: cautionIcon(text), head: '', rest: text };
    }),
  );
}
