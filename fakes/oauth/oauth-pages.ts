import { escapeHtml, renderPage } from '../support/html.js';
import type { AuthRequest } from './auth-request.js';
import { PRESET_IDENTITIES } from './identities.js';

const BANNER = 'Local test stand-in for "Sign in with Google". No real account is used.';
export const DECIDE_PATH = '/o/oauth2/v2/auth/decide';

/** Every form re-posts the original request, so the decision needs no server-side session. */
function hiddenFields(request: AuthRequest): string {
  const fields: Record<string, string> = {
    response_type: 'code',
    client_id: request.clientId,
    redirect_uri: request.redirectUri,
    scope: request.scope,
    state: request.state,
  };
  return Object.entries(fields)
    .map(([name, value]) => `<input type="hidden" name="${name}" value="${escapeHtml(value)}">`)
    .join('\n');
}

export function renderSignIn(request: AuthRequest): string {
  const hidden = hiddenFields(request);
  const presets = PRESET_IDENTITIES.map(
    (p) => `<li><form method="post" action="${DECIDE_PATH}">${hidden}
<button type="submit" name="preset" value="${escapeHtml(p.key)}">${escapeHtml(p.name)} &lt;${escapeHtml(p.email)}&gt;</button>
</form></li>`,
  ).join('\n');
  const body = `<h1>Sign in with a test identity</h1>
<p>The app <strong>${escapeHtml(request.clientId)}</strong> asks to sign you in and return you to
<code>${escapeHtml(request.redirectUri)}</code>.</p>
<h2 id="presets-heading">Choose a test person</h2>
<ul aria-labelledby="presets-heading">
${presets}
</ul>
<h2 id="custom-heading">Or use any identity</h2>
<form method="post" action="${DECIDE_PATH}" aria-labelledby="custom-heading">
${hidden}
<label for="identity-name">Name</label>
<input id="identity-name" name="name" type="text" autocomplete="name" required>
<label for="identity-email">Email</label>
<input id="identity-email" name="email" type="email" autocomplete="email" required>
<p><button type="submit">Continue as this person</button></p>
</form>
<form method="post" action="${DECIDE_PATH}">
${hidden}
<button type="submit" name="decision" value="cancel">Cancel</button>
</form>`;
  return renderPage('Sign in with a test identity', body, BANNER);
}

export function renderAuthError(message: string): string {
  const body = `<h1>Sign-in request rejected</h1>\n<p role="alert">${escapeHtml(message)}</p>`;
  return renderPage('Sign-in request rejected', body, BANNER);
}
