import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import QRCode from 'qrcode';

/** Modules of white border around the symbol; ISO/IEC 18004 asks for at least 4. */
const QUIET_ZONE = 4;

/** A QR code drawn as one SVG path from the symbol's modules (no HTML injection). */
@Component({
  selector: 'dw-bag-qr',
  template: `
    <svg
      xmlns="http://www.w3.org/2000/svg"
      [attr.viewBox]="'0 0 ' + symbol().extent + ' ' + symbol().extent"
      shape-rendering="crispEdges"
      role="img"
      [attr.aria-label]="label()"
      [attr.data-qr-text]="text()"
    >
      <rect [attr.width]="symbol().extent" [attr.height]="symbol().extent" fill="#ffffff" />
      <path [attr.d]="symbol().path" fill="#000000" />
    </svg>
  `,
  styles: `
    :host { display: block; }
    svg { display: block; width: 100%; height: 100%; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BagQr {
  /** What the code holds. */
  readonly text = input.required<string>();
  /** What a screen reader says for it. */
  readonly label = input('QR code');

  protected readonly symbol = computed(() => {
    // Level M restores about 15% of the symbol: enough for a scuffed label on a bag.
    const { modules } = QRCode.create(this.text(), { errorCorrectionLevel: 'M' });
    const size = modules.size;
    let path = '';
    for (let row = 0; row < size; row++) {
      for (let col = 0; col < size; col++) {
        if (modules.get(row, col)) path += `M${col + QUIET_ZONE} ${row + QUIET_ZONE}h1v1h-1z`;
      }
    }
    return { extent: size + 2 * QUIET_ZONE, path, moduleCount: size };
  });
}
