// The fake provider's own pages. No scripts and no inline styles, so they render under a CSP of
// `default-src 'none'; style-src 'self'; img-src data:`; the stylesheet is served by the router.
import { avatarDataUri, loginRuleText, type FakeGitHubAccount } from './github-account';

export const stylesheetPath = '/assets/fake-sign-in.css';

export interface SignInPageModel {
  /** where the router is mounted, e.g. "/fake-github" */
  baseUrl: string;
  requestId: string;
  clientId: string;
  redirectUri: string;
  scopes: string[];
  accounts: FakeGitHubAccount[];
  /** set when a typed login was refused, to show beside the field */
  loginError?: string;
  loginValue?: string;
}

function escapeHtml(text: string): string {
  return text
    .replaceAll('&', '&amp;')
    .replaceAll('<', '&lt;')
    .replaceAll('>', '&gt;')
    .replaceAll('"', '&quot;')
    .replaceAll("'", '&#39;');
}

function layout(baseUrl: string, title: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex">
<title>${escapeHtml(title)}</title>
<link rel="stylesheet" href="${escapeHtml(baseUrl + stylesheetPath)}">
</head>
<body>
<div class="stand-in-band" role="note">Development stand-in &middot; not GitHub &middot; nothing here leaves this machine</div>
<main class="sheet">
${body}
</main>
</body>
</html>
`;
}

function accountButton(account: FakeGitHubAccount): string {
  const primary = account.emails.find((entry) => entry.primary);
  const unverified = primary && !primary.verified ? ' <span class="flag">unverified</span>' : '';
  return `<li><button type="submit" name="account_id" value="${account.id}" class="account">
<img src="${avatarDataUri(account)}" alt="" width="40" height="40">
<span class="who"><strong>${escapeHtml(account.login)}</strong>${account.name ? ` <span class="name">${escapeHtml(account.name)}</span>` : ''}
<span class="meta">id ${account.id}${primary ? ` &middot; ${escapeHtml(primary.email)}${unverified}` : ''}</span>
${account.description ? `<span class="description">${escapeHtml(account.description)}</span>` : ''}</span>
</button></li>`;
}

export function renderSignInPage(model: SignInPageModel): string {
  const action = escapeHtml(`${model.baseUrl}/login/oauth/authorize`);
  const hidden = `<input type="hidden" name="request_id" value="${escapeHtml(model.requestId)}">`;
  const scopes = model.scopes.length
    ? model.scopes.map((scope) => `<code>${escapeHtml(scope)}</code>`).join(' ')
    : '<em>none</em>';
  const loginError = model.loginError
    ? `<p class="field-error" id="login-error">${escapeHtml(model.loginError)}</p>`
    : '';
  const body = `<h1>Fake GitHub — local sign-in for development</h1>
<p class="lead">Choose who you are. The application <code>${escapeHtml(model.clientId)}</code> receives a code at
<code>${escapeHtml(model.redirectUri)}</code>, asking for ${scopes}.</p>
<section aria-labelledby="demo-heading">
<h2 id="demo-heading">Demo accounts</h2>
<form method="post" action="${action}">
${hidden}
<ul class="accounts">
${model.accounts.map(accountButton).join('\n')}
</ul>
</form>
</section>
<section aria-labelledby="new-heading">
<h2 id="new-heading">Another login</h2>
<form method="post" action="${action}" class="new-login">
${hidden}
<label for="login">GitHub login</label>
<input id="login" name="login" required maxlength="39" autocomplete="off" spellcheck="false"
 value="${escapeHtml(model.loginValue ?? '')}"${model.loginError ? ' aria-invalid="true" aria-describedby="login-error"' : ''}>
<button type="submit">Sign in as this login</button>
<p class="hint">A login not listed above becomes a new account with a fresh numeric id (${escapeHtml(loginRuleText)}).</p>
${loginError}
</form>
</section>
<form method="post" action="${action}" class="cancel">
${hidden}
<button type="submit" name="decision" value="cancel">Cancel and return to the application</button>
</form>`;
  return layout(model.baseUrl, 'Fake GitHub — local sign-in', body);
}

/** An error the person has to read: GitHub shows a page rather than redirecting to an untrusted address. */
export function renderErrorPage(baseUrl: string, title: string, message: string): string {
  const body = `<h1>Fake GitHub — ${escapeHtml(title)}</h1>
<p class="problem">${escapeHtml(message)}</p>
<p>Start the sign-in again from the application.</p>`;
  return layout(baseUrl, `Fake GitHub — ${title}`, body);
}

/** Where an account's html_url leads: a profile card instead of a link to the real GitHub. */
export function renderProfilePage(baseUrl: string, account: FakeGitHubAccount): string {
  const body = `<h1 class="profile"><img src="${avatarDataUri(account)}" alt="" width="64" height="64"> ${escapeHtml(account.login)}</h1>
<p>${account.name ? `${escapeHtml(account.name)} &middot; ` : ''}GitHub id ${account.id} on the fake provider</p>
${account.description ? `<p class="lead">${escapeHtml(account.description)}</p>` : ''}`;
  return layout(baseUrl, `Fake GitHub — ${account.login}`, body);
}

export const signInStylesheet = `:root {
  color-scheme: light;
  --ink: #1f2328;
  --muted: #5b6169;
  --paper: #f6f4ef;
  --card: #ffffff;
  --rule: #d8d3c8;
  --accent: #2f6f5e;
  --warn: #9a3b12;
}
* { box-sizing: border-box; }
body {
  margin: 0;
  background: var(--paper);
  color: var(--ink);
  font: 15px/1.5 system-ui, -apple-system, "Segoe UI", sans-serif;
}
.stand-in-band {
  padding: 0.45rem 1rem;
  background: #f2c14e;
  color: #1f2328;
  font-weight: 700;
  letter-spacing: 0.04em;
  text-transform: uppercase;
  font-size: 12px;
  text-align: center;
}
.stand-in-band::after {
  content: "";
  display: block;
  height: 6px;
  margin: 0.45rem -1rem -0.45rem;
  background: repeating-linear-gradient(135deg, #f2c14e 0 10px, #1f2328 10px 20px);
}
.sheet { max-width: 40rem; margin: 2rem auto; padding: 0 1rem; }
h1 { font-size: 1.4rem; margin: 0 0 0.5rem; }
h2 { font-size: 1rem; margin: 1.5rem 0 0.5rem; color: var(--muted); text-transform: uppercase; letter-spacing: 0.06em; }
.lead { color: var(--muted); }
code { font-family: ui-monospace, "SFMono-Regular", Menlo, monospace; font-size: 0.9em; background: #ebe7dd; padding: 0 0.25em; border-radius: 3px; overflow-wrap: anywhere; }
.accounts { list-style: none; margin: 0; padding: 0; display: grid; gap: 0.5rem; }
.account {
  display: flex; gap: 0.75rem; align-items: flex-start; width: 100%;
  padding: 0.6rem 0.8rem; text-align: left; font: inherit; color: inherit;
  background: var(--card); border: 1px solid var(--rule); border-left: 4px solid var(--accent); border-radius: 4px;
  cursor: pointer;
}
.account:hover, .account:focus-visible { border-color: var(--accent); outline: 2px solid var(--accent); outline-offset: 1px; }
.account img { border-radius: 50%; flex: none; }
.who { display: flex; flex-direction: column; }
.name { color: var(--muted); font-weight: normal; }
.meta, .description, .hint { color: var(--muted); font-size: 0.85rem; }
.flag { color: var(--warn); font-weight: 600; }
.new-login { display: flex; flex-wrap: wrap; gap: 0.5rem; align-items: center; }
.new-login label { width: 100%; font-weight: 600; }
.new-login input { flex: 1 1 14rem; padding: 0.45rem 0.6rem; font: inherit; border: 1px solid var(--rule); border-radius: 4px; }
.new-login input[aria-invalid="true"] { border-color: var(--warn); }
button { font: inherit; }
.new-login button, .cancel button {
  padding: 0.45rem 0.9rem; border-radius: 4px; cursor: pointer;
  border: 1px solid var(--accent); background: var(--accent); color: #fff;
}
.cancel { margin-top: 2rem; }
.cancel button { background: transparent; color: var(--ink); border-color: var(--rule); }
.field-error, .problem { color: var(--warn); font-weight: 600; }
.hint { width: 100%; margin: 0; }
.profile { display: flex; align-items: center; gap: 0.75rem; }
.profile img { border-radius: 50%; }
`;
