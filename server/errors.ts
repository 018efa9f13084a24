/** The one error type services throw; the error middleware turns it into `{ error: { code, message, fields? } }`. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const notSignedIn = () => new AppError(401, 'not_signed_in', 'Sign in to continue.');
export const forbidden = (message = 'Your role in this team does not allow this.') => new AppError(403, 'forbidden', message);
export const notFound = (what: string) => new AppError(404, 'not_found', `${what} was not found.`);
