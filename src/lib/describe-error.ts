import { isApiError } from "./api-client.ts";

/** A short, human sentence for any error a screen may need to show, plus the request id to quote. */
export function describeError(error: unknown): { message: string; reference?: string } {
  if (isApiError(error)) {
    if (error.status === 0) return { message: "Bellwether's server could not be reached. Check the connection and try again." };
    if (error.status === 403) return { message: "Your roles do not allow this action.", reference: error.requestId };
    if (error.status >= 500) {
      return { message: "The server ran into a problem. Try again; if it keeps happening, tell an administrator.", reference: error.requestId };
    }
    return { message: error.message, reference: error.requestId };
  }
  if (error instanceof Error && error.message) return { message: error.message };
  return { message: "Something went wrong." };
}

/** The same sentence as one line, with the request id when there is one (for toasts). */
export function describeErrorLine(error: unknown): string {
  const { message, reference } = describeError(error);
  return reference ? `${message} (request ${reference})` : message;
}
