import type { RequestHandler } from 'express';

export type LogLine = (line: string) => void;

/** One line per request once the response is finished, tagged with the fake's name. */
export function requestLog(name: string, log: LogLine): RequestHandler {
  return (req, res, next) => {
    const started = performance.now();
    res.on('finish', () => {
      const ms = Math.round(performance.now() - started);
      log(`[${name}] ${req.method} ${req.originalUrl} ${res.statusCode} ${ms}ms`);
    });
    next();
  };
}
