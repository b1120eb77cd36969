import type { ErrorRequestHandler, RequestHandler } from "express";
import { MulterError } from "multer";
import { AppError } from "../errors.ts";
import type { ApiErrorBody } from "../../shared/api/errors.ts";

/** JSON 404 for any /api path no router answered. */
export const apiNotFound: RequestHandler = (req, res) => {
  const body: ApiErrorBody = {
    error: { code: "NOT_FOUND", message: `No API route ${req.method} ${req.originalUrl.split("?")[0]}.`, requestId: String(req.id ?? "") },
  };
  res.status(404).json(body);
};

interface HttpishError {
  status?: number;
  statusCode?: number;
  code?: string;
  type?: string;
  expose?: boolean;
  message?: string;
}

/** The one error handler: typed errors keep their status and code, everything else is a 500. */
export const errorHandler: ErrorRequestHandler = (err: unknown, req, res, _next) => {
  const requestId = String(req.id ?? "");
  let status = 500;
  let code = "INTERNAL";
  let message = "Something went wrong on the server. The request id helps the administrator find it in the log.";
  let details: unknown;

  if (err instanceof AppError) {
    ({ status, code, message, details } = err);
  } else if (err instanceof MulterError) {
    status = err.code === "LIMIT_FILE_SIZE" ? 413 : 400;
    code = err.code === "LIMIT_FILE_SIZE" ? "FILE_TOO_LARGE" : "UPLOAD_INVALID";
    message = `Upload refused: ${err.message}.`;
  } else if (typeof err === "object" && err !== null) {
    const e = err as HttpishError;
    const httpStatus = e.status ?? e.statusCode;
    if (httpStatus && httpStatus >= 400 && httpStatus < 500) {
      status = httpStatus;
      code = e.code && /^[A-Z_]+$/.test(e.code) ? e.code : e.type === "entity.parse.failed" ? "MALFORMED_JSON" : "BAD_REQUEST";
      message = e.type === "entity.parse.failed" ? "The request body is not valid JSON." : e.expose !== false && e.message ? e.message : "Bad request.";
    }
  }
  if (status >= 500) req.log?.error({ err }, "request failed");
  const body: ApiErrorBody = { error: { code, message, ...(details === undefined ? {} : { details }), requestId } };
  if (!res.headersSent) res.status(status).json(body);
};
