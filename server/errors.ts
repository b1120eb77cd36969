/** Typed application errors; the error handler maps each to its HTTP status and stable code. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

export class ValidationError extends AppError {
  constructor(message: string, details?: unknown) {
    super(400, "VALIDATION_FAILED", message, details);
  }
}
export class UnauthenticatedError extends AppError {
  constructor(message = "Sign in first.") {
    super(401, "UNAUTHENTICATED", message);
  }
}
export class ForbiddenError extends AppError {
  constructor(message = "Your roles do not allow this action.") {
    super(403, "FORBIDDEN", message);
  }
}
export class NotFoundError extends AppError {
  constructor(what: string) {
    super(404, "NOT_FOUND", `${what} was not found.`);
  }
}
export class ConflictError extends AppError {
  constructor(message: string, details?: unknown) {
    super(409, "CONFLICT", message, details);
  }
}
