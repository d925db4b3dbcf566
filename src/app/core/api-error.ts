import { HttpErrorResponse } from '@angular/common/http';

/** The JSON body the hub sends with every error status. */
export interface ApiErrorBody {
  error: string;
  details?: unknown;
}

const STATUS_SENTENCES: Record<number, string> = {
  0: 'The hub cannot be reached. Check the Wi-Fi and try again.',
  400: 'The hub could not use what was sent. Check the entries and try again.',
  401: 'You are signed out. Sign in again.',
  403: 'Your role cannot do that.',
  404: 'The hub could not find that.',
  409: 'Someone changed this at the same time. Reload and try again.',
  429: 'Too many attempts. Wait a minute and try again.',
};

const SERVER_TROUBLE = 'The hub had a problem. Try again in a moment; tell your lead if it keeps happening.';

/** True when `error` is an HTTP error response with the given status. */
export function hasStatus(error: unknown, ...statuses: number[]): boolean {
  return error instanceof HttpErrorResponse && statuses.includes(error.status);
}

/** Turns a failed hub call into one sentence a person can act on. */
export function apiErrorSentence(error: unknown, fallback = 'Something went wrong. Try again.'): string {
  if (!(error instanceof HttpErrorResponse)) {
    return fallback;
  }
  const body = error.error as Partial<ApiErrorBody> | null;
  if (body && typeof body === 'object' && typeof body.error === 'string' && body.error.trim()) {
    const details = detailSentences(body.details);
    return details.length ? `${body.error} ${details.join(' ')}` : body.error;
  }
  if (error.status >= 500) {
    return SERVER_TROUBLE;
  }
  return STATUS_SENTENCES[error.status] ?? fallback;
}

/** Field problems in `details` ("email: Enter an e-mail address.") as sentences. */
function detailSentences(details: unknown): string[] {
  if (!Array.isArray(details)) {
    return [];
  }
  return details.flatMap((detail: unknown) => {
    if (typeof detail === 'string') {
      return [endSentence(detail)];
    }
    if (detail && typeof detail === 'object' && typeof (detail as { message?: unknown }).message === 'string') {
      const { message, path } = detail as { message: string; path?: unknown };
      const field = Array.isArray(path) ? path.join('.') : typeof path === 'string' ? path : '';
      return [endSentence(field ? `${field}: ${message}` : message)];
    }
    return [];
  });
}

function endSentence(text: string): string {
  return /[.!?]$/.test(text) ? text : `${text}.`;
}
