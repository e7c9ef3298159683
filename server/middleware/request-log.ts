import { randomUUID } from 'node:crypto';
import type { RequestHandler } from 'express';

declare module 'express-serve-static-core' {
  interface Request {
    id?: string;
  }
}

/** Gives each request an id (echoed as X-Request-Id) and logs one line when it finishes. */
export function requestLog(opts: { enabled: boolean; log: (line: string) => void }): RequestHandler {
  return (req, res, next) => {
    const incoming = req.get('x-request-id');
    req.id = incoming && /^[\w-]{1,64}$/.test(incoming) ? incoming : randomUUID();
    res.setHeader('X-Request-Id', req.id);
    const started = process.hrtime.bigint();
    if (opts.enabled) {
      res.on('finish', () => {
        const ms = Number(process.hrtime.bigint() - started) / 1e6;
        opts.log(`[${req.id}] ${req.method} ${req.originalUrl} ${res.statusCode} ${ms.toFixed(1)}ms`);
      });
    }
    next();
  };
}
