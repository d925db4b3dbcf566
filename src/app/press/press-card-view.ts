import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { JobLayer } from '../../shared/intake-contract';
import type { PeelKind, PressureClass } from '../../shared/names';
import { temperatureReading } from '../../shared/press/dual-units';
import type { PressCard as PressCardData } from '../../shared/press/press-contract';
import { PressCautions } from './press-cautions';

/** How each peel is told apart without colour: an icon, a word and what to do. */
export const PEEL_DISPLAY: Readonly<Record<PeelKind, { icon: string; label: string; how: string }>> = {
  hot: { icon: 'peel-hot', label: 'Hot peel', how: 'Peel at once, while hot.' },
  warm: { icon: 'peel-warm', label: 'Warm peel', how: 'Wait a few seconds, peel warm.' },
  cold: { icon: 'peel-cold', label: 'Cold peel', how: 'Let it cool fully, then peel.' },
};

const PRESSURE_LABELS: Readonly<Record<PressureClass, string>> = { light: 'Light', medium: 'Medium', firm: 'Firm', heavy: 'Heavy' };

/** "302 °F" as its number and its unit, so the number can be drawn larger than the unit. */
function splitReading(reading: string): { value: string; unit: string } {
  const space = reading.lastIndexOf(' ');
  return space > 0 ? { value: reading.slice(0, space), unit: reading.slice(space + 1) } : { value: reading, unit: '' };
}

/** One line of the layer order: a numbered press with its film and seconds. */
interface LayerLine {
  position: number;
  filmName: string;
  colour: string;
  swatch: string | null;
  action: string;
  seconds: number;
}

/** The Press card for the operator: temperature, dwell, pressure, peel, layer order, warnings, cautions. */
@Component({
  selector: 'dw-press-card-view',
  imports: [MatIconModule, PressCautions],
  templateUrl: './press-card-view.html',
  styleUrl: './press-card-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PressCardView {
  /** The resolved card for this bag on this press. */
  readonly card = input.required<PressCardData>();
  /** The job's layers, for the film colour swatches (the card names colours, the job knows their hex). */
  readonly jobLayers = input<readonly JobLayer[]>([]);

  protected readonly temperature = computed(() => splitReading(this.card().display.temperature.primary));
  protected readonly gauge = computed(() => (this.card().display.gauge ? splitReading(this.card().display.gauge!.primary) : null));
  protected readonly peel = computed(() => PEEL_DISPLAY[this.card().peel]);
  protected readonly pressure = computed(() => PRESSURE_LABELS[this.card().pressureClass]);
  protected readonly airPress = computed(() => this.card().press.kind === 'air' && !!this.card().display.gauge);
  protected readonly overLimit = computed(() => this.card().totalHeatS > this.card().heatExposureLimitS);
  protected readonly suggestions = computed(() =>
    this.card().suggestions.map((s) => ({ ...s, reading: temperatureReading(s.tempC, this.card().units).primary })),
  );
  protected readonly hasWarnings = computed(() => this.card().warnings.length > 0 || this.card().suggestions.length > 0);

  protected readonly layerLines = computed<LayerLine[]>(() => {
    const card = this.card();
    const hexByFilm = new Map(this.jobLayers().map((layer) => [layer.filmId, layer.colourHex]));
    return card.steps.map((step, i) => {
      const layer = card.layers[i];
      return {
        position: i + 1,
        filmName: layer?.filmTypeName ?? '',
        colour: layer?.colour ?? '',
        swatch: hexByFilm.get(step.filmId) ?? null,
        action: step.kind === 'tack' ? 'Tack' : 'Dwell',
        seconds: step.seconds,
      };
    });
  });
}
