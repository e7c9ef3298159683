import express, { type Express, type Response } from 'express';
import { requestLog, type LogLine } from '../support/request-log.js';
import { renderInbox, renderMessage, renderMissingMessage } from './inbox-page.js';
import { toMessageView, type MailStore } from './mail-store.js';

/** Pages may embed only inline styles; mail HTML is confined to the sandboxed iframe. */
const PAGE_CSP = "default-src 'none'; style-src 'unsafe-inline'; img-src data:; frame-ancestors 'none'";

function notFound(res: Response, id: string): void {
  res.status(404).json({ error: { code: 'not_found', message: `No message with id ${id}` } });
}

/** HTTP API and HTML inbox over the mail the SMTP fake received. */
export function createInspectApp(store: MailStore, log: LogLine): Express {
  const app = express();
  app.disable('x-powered-by');
  app.use(requestLog('mail', log));

  app.get('/messages', (req, res) => {
    const to = typeof req.query.to === 'string' ? req.query.to : undefined;
    res.json(store.list(to).map(toMessageView));
  });
  app.get('/messages/:id', (req, res) => {
    const message = store.get(req.params.id);
    if (message) res.json(toMessageView(message));
    else notFound(res, req.params.id);
  });
  app.get('/messages/:id/attachments/:index', (req, res) => {
    const attachment = store.get(req.params.id)?.attachments[Number(req.params.index)];
    if (!attachment) return notFound(res, req.params.id);
    res.attachment(attachment.filename).type(attachment.contentType).send(attachment.content);
  });
  app.delete('/messages', (_req, res) => {
    store.clear();
    res.status(204).end();
  });
  app.get('/', (_req, res) => {
    res.set('Content-Security-Policy', PAGE_CSP).type('html').send(renderInbox(store.list()));
  });
  app.get('/inbox/:id', (req, res) => {
    const message = store.get(req.params.id);
    res.set('Content-Security-Policy', PAGE_CSP).type('html');
    if (message) res.send(renderMessage(message));
    else res.status(404).send(renderMissingMessage(req.params.id));
  });
  return app;
}
