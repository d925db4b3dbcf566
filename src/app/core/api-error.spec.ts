import { HttpErrorResponse } from '@angular/common/http';
import { apiErrorSentence } from './api-error';

function failure(status: number, error: unknown): HttpErrorResponse {
  return new HttpErrorResponse({ status, error, url: '/api/x' });
}

describe('apiErrorSentence', () => {
  it("uses the hub's own sentence when the body carries one", () => {
    expect(apiErrorSentence(failure(401, { error: 'That e-mail and password do not match.' }))).toBe(
      'That e-mail and password do not match.',
    );
  });

  it('adds field details to the sentence', () => {
    const error = failure(400, { error: 'Check the form.', details: [{ path: ['email'], message: 'Enter an e-mail address' }] });

    expect(apiErrorSentence(error)).toBe('Check the form. email: Enter an e-mail address.');
  });

  it('says the hub cannot be reached when there is no network', () => {
    expect(apiErrorSentence(failure(0, new ProgressEvent('error')))).toMatch(/cannot be reached/);
  });

  it('explains a server fault without a body in plain words', () => {
    expect(apiErrorSentence(failure(502, '<html>Bad gateway</html>'))).toMatch(/^The hub had a problem/);
  });

  it('falls back to the given sentence for something that is not an HTTP error', () => {
    expect(apiErrorSentence(new Error('boom'), 'Pairing did not work.')).toBe('Pairing did not work.');
  });
});
