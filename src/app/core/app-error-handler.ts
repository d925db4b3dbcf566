import { ErrorHandler, Injectable, Injector, inject } from '@angular/core';
import { HttpErrorResponse } from '@angular/common/http';
import { MatSnackBar } from '@angular/material/snack-bar';
import { apiErrorSentence } from './api-error';

const SCREEN_TROUBLE =
  'Something went wrong on this screen. Reload the page; if it happens again, tell your lead.';

/** Tells the person on the floor, in one sentence, that something failed; logs the detail. */
@Injectable()
export class AppErrorHandler implements ErrorHandler {
  // Looked up on demand: the handler is created before the snack bar's overlay is available.
  private readonly injector = inject(Injector);

  handleError(error: unknown): void {
    console.error(error);
    const cause = (error as { rejection?: unknown })?.rejection ?? error;
    const sentence = cause instanceof HttpErrorResponse ? apiErrorSentence(cause) : SCREEN_TROUBLE;
    try {
      this.injector.get(MatSnackBar).open(sentence, 'OK', { duration: 10000, politeness: 'assertive' });
    } catch (snackBarError) {
      console.error(snackBarError);
    }
  }
}
