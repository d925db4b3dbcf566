/** An error the hub answers with its own status and a sentence a person can act on. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly details?: readonly { path: string; message: string }[],
  ) {
    super(message);
    this.name = 'HttpError';
  }
}

/** 400: the request itself is wrong. */
export const badRequest = (message: string, details?: HttpError['details']) => new HttpError(400, message, details);
/** 401: nobody is signed in, or the credentials are wrong. */
export const unauthorized = (message = 'Sign in first.') => new HttpError(401, message);
/** 403: signed in, but this role may not do this. */
export const forbidden = (message = 'Your role may not do this. Ask a lead or the owner.') => new HttpError(403, message);
/** 404: the thing asked for does not exist. */
export const notFound = (message: string) => new HttpError(404, message);
/** 409: the request clashes with what is stored. */
export const conflict = (message: string) => new HttpError(409, message);
