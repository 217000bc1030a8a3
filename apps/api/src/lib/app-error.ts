/** The one error class for operational failures: bad input, not found, conflict, too large. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'AppError';
  }

  static badRequest(message: string, details?: unknown) {
    return new AppError(400, 'bad_request', message, details);
  }

  static notFound(what: string) {
    return new AppError(404, 'not_found', `${what} was not found`);
  }

  static conflict(message: string, details?: unknown) {
    return new AppError(409, 'conflict', message, details);
  }
}
