import { Agent, request } from 'node:http';
import { createServer, type Server } from 'node:net';
import nodemailer from 'nodemailer';
import { describe, expect, it } from 'vitest';
import { startFakes } from '../../../fakes/index.js';

function listenOn(port: number): Promise<Server> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve(server));
  });
}

function closeServer(server: Server): Promise<void> {
  return new Promise((resolve) => server.close(() => resolve()));
}

async function freePort(): Promise<number> {
  const server = await listenOn(0);
  const address = server.address();
  await closeServer(server);
  if (address === null || typeof address === 'string') throw new Error('no port');
  return address.port;
}

/** Leaves a keep-alive connection open, as the Stripe SDK's agent does. */
function keepAliveGet(url: string, agent: Agent): Promise<number> {
  return new Promise((resolve, reject) => {
    request(url, { agent }, (res) => {
      res.resume();
      res.on('end', () => resolve(res.statusCode ?? 0));
    }).on('error', reject).end();
  });
}

describe('startFakes', () => {
  it('binds free ports when asked for port 0 and reports them', async () => {
    const fakes = await startFakes({ smtpPort: 0, mailInspectPort: 0, oauthPort: 0, stripePort: 0 });
    try {
      const ports = [fakes.smtpPort, fakes.mailInspectPort, fakes.oauthPort, fakes.stripePort];
      expect(ports.every((port) => port > 0)).toBe(true);
      expect(new Set(ports).size).toBe(4);
      expect((await fetch(`http://127.0.0.1:${fakes.mailInspectPort}/messages`)).status).toBe(200);
    } finally {
      await fakes.close();
    }
  });

  it('closes promptly despite open keep-alive HTTP and pooled SMTP connections', async () => {
    const fakes = await startFakes({ smtpPort: 0, mailInspectPort: 0, oauthPort: 0, stripePort: 0 });
    const agent = new Agent({ keepAlive: true });
    const mailer = nodemailer.createTransport({ pool: true, host: '127.0.0.1', port: fakes.smtpPort, secure: false, ignoreTLS: true });
    await keepAliveGet(`http://127.0.0.1:${fakes.stripePort}/__fake/sessions`, agent);
    await mailer.sendMail({ from: 'a@ebbroot.test', to: 'b@example.com', subject: 'pooled', text: 'x' });

    const started = performance.now();
    await fakes.close();

    expect(performance.now() - started).toBeLessThan(1000);
    agent.destroy();
    mailer.close();
  });

  it('frees every port it bound when a later port is taken', async () => {
    const [smtpPort, mailInspectPort, oauthPort] = [await freePort(), await freePort(), await freePort()];
    const occupied = await listenOn(0);
    const address = occupied.address();
    const stripePort = address !== null && typeof address !== 'string' ? address.port : 0;

    try {
      await expect(startFakes({ smtpPort, mailInspectPort, oauthPort, stripePort })).rejects.toMatchObject({ code: 'EADDRINUSE' });
      for (const port of [smtpPort, mailInspectPort, oauthPort]) await closeServer(await listenOn(port));
    } finally {
      await closeServer(occupied);
    }
  });

  it('sends one log line per request to opts.log', async () => {
    const lines: string[] = [];
    const fakes = await startFakes({ smtpPort: 0, mailInspectPort: 0, oauthPort: 0, stripePort: 0, log: (line) => lines.push(line) });
    try {
      await fetch(`http://127.0.0.1:${fakes.stripePort}/v1/checkout/sessions/cs_test_x`);
      await new Promise((resolve) => setTimeout(resolve, 20));
    } finally {
      await fakes.close();
    }
    expect(lines).toContainEqual(expect.stringMatching(/^\[stripe\] GET \/v1\/checkout\/sessions\/cs_test_x 401 \d+ms$/));
  });
});
