#!/usr/bin/env node
// Development mail sink: accepts SMTP on 127.0.0.1:SMTP_PORT, keeps every message, and shows
// them at http://127.0.0.1:MAIL_VIEWER_PORT (HTML) and /api/messages (JSON, for tests).
// Loopback only; refuses to run in production.
import { mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:http';
import { join } from 'node:path';

import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

if (process.env.NODE_ENV === 'production') {
  console.error('mail-sink: refusing to run with NODE_ENV=production; configure SMTP_URL for a real server');
  process.exit(1);
}
const smtpPort = Number(process.env.SMTP_PORT ?? 1025);
const viewerPort = Number(process.env.MAIL_VIEWER_PORT ?? 1080);
const dataDir = process.env.MAIL_DATA_DIR ?? '.data/mail';
const store = join(dataDir, 'messages.json');
const MAX_MESSAGES = 500;

mkdirSync(dataDir, { recursive: true });
let messages = [];
try { messages = JSON.parse(readFileSync(store, 'utf8')); } catch { messages = []; }
let nextId = messages.reduce((max, m) => Math.max(max, m.id), 0) + 1;

function persist() {
  writeFileSync(`${store}.tmp`, JSON.stringify(messages));
  renameSync(`${store}.tmp`, store);
}

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS'],
  banner: 'Endgrain development mail sink',
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((mail) => {
        messages.push({
          id: nextId++,
          receivedAt: new Date().toISOString(),
          from: mail.from?.text ?? '',
          to: session.envelope.rcptTo.map((r) => r.address),
          subject: mail.subject ?? '',
          text: mail.text ?? '',
          html: typeof mail.html === 'string' ? mail.html : '',
        });
        if (messages.length > MAX_MESSAGES) messages = messages.slice(-MAX_MESSAGES);
        persist();
        callback();
      })
      .catch(callback);
  },
});
smtp.on('error', (err) => console.error('mail-sink smtp error:', err.message));

const escape = (s) => String(s).replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
const linkify = (s) => escape(s).replace(/(https?:\/\/[^\s<]+)/g, '<a href="$1">$1</a>');

function page() {
  const rows = [...messages].reverse().map((m) => `
    <article><header><strong>${escape(m.subject)}</strong><br>
    <small>to ${escape(m.to.join(', '))} · ${escape(m.receivedAt)}</small></header>
    <pre>${linkify(m.text)}</pre></article>`).join('');
  return `<!doctype html><html lang="en"><head><meta charset="utf-8">
  <meta name="viewport" content="width=device-width, initial-scale=1"><title>Endgrain mail sink</title>
  <style>body{font-family:system-ui,sans-serif;max-width:760px;margin:1rem auto;padding:0 1rem;background:#f6efe2;color:#1d2a22}
  article{background:#fff;border-radius:8px;padding:.75rem 1rem;margin:.75rem 0;box-shadow:0 1px 2px #0002}
  pre{white-space:pre-wrap;font-family:inherit}a{color:#1f5a3d}</style></head>
  <body><h1>Development mail sink</h1><p>Messages the server sent on this machine; nothing leaves it.
  JSON at <a href="/api/messages">/api/messages</a>.</p>${rows || '<p>No messages yet.</p>'}</body></html>`;
}

const viewer = createServer((req, res) => {
  const url = new URL(req.url ?? '/', 'http://localhost');
  const json = (status, body) => { res.writeHead(status, { 'content-type': 'application/json' }); res.end(JSON.stringify(body)); };
  if (url.pathname === '/api/messages' && req.method === 'GET') {
    const to = url.searchParams.get('to');
    return json(200, to ? messages.filter((m) => m.to.includes(to.toLowerCase())) : messages);
  }
  if (url.pathname === '/api/messages' && req.method === 'DELETE') { messages = []; persist(); return json(200, { deleted: true }); }
  const one = /^\/api\/messages\/(\d+)$/.exec(url.pathname);
  if (one) { const m = messages.find((x) => x.id === Number(one[1])); return m ? json(200, m) : json(404, { message: 'no such message' }); }
  if (url.pathname === '/health') return json(200, { status: 'ok' });
  if (url.pathname === '/') { res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' }); return res.end(page()); }
  json(404, { message: 'not found' });
});

smtp.listen(smtpPort, '127.0.0.1', () => {
  viewer.listen(viewerPort, '127.0.0.1', () => {
    console.log(`mail-sink: SMTP on 127.0.0.1:${smtpPort}, viewer on http://127.0.0.1:${viewerPort}`);
  });
});
const stop = () => { smtp.close(() => viewer.close(() => process.exit(0))); setTimeout(() => process.exit(0), 2000).unref(); };
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
