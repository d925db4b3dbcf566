import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';
import { MatButtonModule } from '@angular/material/button';

/** Asks the lead to confirm cancelling an order; closes with `true` to cancel it. */
@Component({
  selector: 'dw-cancel-order-dialog',
  imports: [MatDialogModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>Cancel order {{ data.code }}?</h2>
    <mat-dialog-content>
      <p>Its bags leave the floor's queue. The order stays on the list as cancelled.</p>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-stroked-button type="button" [mat-dialog-close]="false">Keep the order</button>
      <button mat-flat-button class="danger" type="button" [mat-dialog-close]="true" data-testid="confirm-cancel">
        Cancel the order
      </button>
    </mat-dialog-actions>
  `,
  styles: `
    p { font-size: 1.25rem; }
    h2 { font-size: 1.75rem; }
    .danger.mat-mdc-button-base {
      --mat-button-filled-container-color: var(--mat-sys-error);
      --mat-button-filled-label-text-color: var(--mat-sys-on-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CancelOrderDialog {
  protected readonly data = inject<{ code: string }>(MAT_DIALOG_DATA);
}
