import { Router } from 'express';
import type { Mailbox, MailboxMessage } from '@server/lib/mail/fake-smtp';
import { localRequestsOnly } from '@server/middleware/loopback-only';

// The local mailbox: what the fake SMTP receiver caught. It holds password-reset and invitation
// links, so it answers only requests made on this machine. Never mounted in production.
const onThisMachine = localRequestsOnly('local mailbox');

export function devMailboxApiRoutes(mailbox: Mailbox): Router {
  const router = Router();
  router.get('/dev/mailbox', onThisMachine, (_req, res) => {
    res.json({ messages: mailbox.list() });
  });
  return router;
}

const escapeHtml = (text: string) =>
  text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

function renderMessage(m: MailboxMessage): string {
  const links = m.links.map((l) => `<li><a href="${escapeHtml(l)}">${escapeHtml(l)}</a></li>`).join('');
  return `<article>
  <header><h2>${escapeHtml(m.subject)}</h2>
  <p class="meta">To <b>${escapeHtml(m.to)}</b> · from ${escapeHtml(m.from)} · ${escapeHtml(m.receivedAt)}</p></header>
  ${links ? `<ul class="links">${links}</ul>` : ''}
  <pre>${escapeHtml(m.text)}</pre>
</article>`;
}

/** A plain server-rendered page, so it works before the client is built and cannot ship by accident. */
export function devMailboxPage(mailbox: Mailbox): Router {
  const router = Router();
  router.get('/dev/mailbox', onThisMachine, (_req, res) => {
    const messages = mailbox.list();
    const body = messages.length
      ? messages.map(renderMessage).join('\n')
      : '<p class="empty">No e-mail yet. Invitations and password resets sent while the app runs land here.</p>';
    res.type('html').send(`<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Local mailbox · Mixwright</title>
<style>
  body { margin: 0; background: #f7f4ec; color: #1d2a44; font: 16px/1.5 system-ui, sans-serif; }
  main { max-width: 56rem; margin: 0 auto; padding: 2rem 1.25rem; }
  h1 { font-size: 1.5rem; margin: 0 0 .25rem; } .note { color: #56607a; margin: 0 0 1.5rem; }
  article { background: #fffdf8; border: 1px solid #ddd6c6; border-radius: 6px; padding: 1rem 1.25rem; margin-bottom: 1rem; }
  h2 { font-size: 1.1rem; margin: 0; } .meta { color: #56607a; font-size: .875rem; margin: .25rem 0 .75rem; }
  pre { white-space: pre-wrap; font: 14px/1.5 ui-monospace, monospace; background: #f2efe6; padding: .75rem; border-radius: 4px; margin: 0; }
  a { color: #0f766e; word-break: break-all; } a:focus-visible { outline: 2px solid #0f766e; outline-offset: 2px; }
  .links { padding-left: 1.25rem; margin: 0 0 .75rem; } .empty { color: #56607a; }
</style></head>
<body><main>
<h1>Local mailbox</h1>
<p class="note">This Mixwright has no outgoing mail server, so the e-mail it sends is caught here, newest first.
It can be read only on this computer (at a localhost address), because reset and invitation links let anyone
who holds them in. <a href="/">Back to Mixwright</a></p>
${body}
</main></body></html>`);
  });
  return router;
}
