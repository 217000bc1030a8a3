// Accounts of the fake GitHub provider and the JSON shapes GitHub's REST API gives for them.

export interface FakeGitHubEmail {
  email: string;
  primary: boolean;
  verified: boolean;
  /** GitHub's field: "public" or "private" on the primary address, null on the others */
  visibility: 'public' | 'private' | null;
}

export interface FakeGitHubAccount {
  /** GitHub's numeric user id: the stable identity (logins can be renamed) */
  id: number;
  login: string;
  name: string | null;
  /** exactly one is primary */
  emails: FakeGitHubEmail[];
  /** shown on the sign-in page only; GitHub has no such field */
  description?: string;
}

// GitHub's login rule (from memory, not found in a published document): letters, digits and
// single hyphens, no hyphen at either end, at most 39 characters.
const loginPattern = /^[A-Za-z0-9](?:[A-Za-z0-9]|-(?=[A-Za-z0-9])){0,38}$/;
const emailPattern = /^[^@\s]+@[^@\s]+\.[^@\s]+$/;

export function isValidGitHubLogin(login: string): boolean {
  return loginPattern.test(login);
}

export const loginRuleText =
  'letters, digits and single hyphens, not starting or ending with a hyphen, at most 39 characters';

/** Throws a message naming the account and the field when the account cannot be a GitHub user. */
export function assertValidAccount(account: FakeGitHubAccount): void {
  const where = `fake GitHub account ${JSON.stringify(account?.login ?? account?.id)}`;
  if (!Number.isSafeInteger(account.id) || account.id <= 0) {
    throw new TypeError(`${where}: id must be a positive integer, got ${String(account.id)}`);
  }
  if (typeof account.login !== 'string' || !isValidGitHubLogin(account.login)) {
    throw new TypeError(`${where}: login must be ${loginRuleText}`);
  }
  if (account.name !== null && typeof account.name !== 'string') {
    throw new TypeError(`${where}: name must be a string or null`);
  }
  if (!Array.isArray(account.emails) || account.emails.length === 0) {
    throw new TypeError(`${where}: emails must list at least one address`);
  }
  account.emails.forEach((entry, index) => {
    if (typeof entry.email !== 'string' || !emailPattern.test(entry.email)) {
      throw new TypeError(`${where}: emails[${index}].email is not an e-mail address`);
    }
    if (!['public', 'private', null].includes(entry.visibility)) {
      throw new TypeError(
        `${where}: emails[${index}].visibility must be "public", "private" or null`,
      );
    }
  });
  const primaries = account.emails.filter((entry) => entry.primary).length;
  if (primaries !== 1) {
    throw new TypeError(`${where}: exactly one e-mail must be primary, found ${primaries}`);
  }
}

export function cloneAccount(account: FakeGitHubAccount): FakeGitHubAccount {
  return { ...account, emails: account.emails.map((entry) => ({ ...entry })) };
}

/** The address GitHub shows on the profile: here, the first verified one marked public. */
function publicEmail(account: FakeGitHubAccount): string | null {
  return (
    account.emails.find((entry) => entry.verified && entry.visibility === 'public')?.email ?? null
  );
}

/**
 * GET /user as GitHub answers it, with the fields a sign-in needs. The avatar is a data: URI so
 * that no page showing it reaches another host and a CSP of `img-src 'self' data:` allows it.
 */
export function userJson(account: FakeGitHubAccount, htmlBase: string) {
  return {
    login: account.login,
    id: account.id,
    node_id: `U_fake${account.id}`,
    avatar_url: avatarDataUri(account),
    html_url: `${htmlBase}/${account.login}`,
    type: 'User',
    site_admin: false,
    name: account.name,
    email: publicEmail(account),
  };
}

/** GET /user/emails as GitHub answers it. */
export function emailsJson(account: FakeGitHubAccount) {
  return account.emails.map(({ email, primary, verified, visibility }) => ({
    email,
    primary,
    verified,
    visibility,
  }));
}

function initials(account: FakeGitHubAccount): string {
  const source = account.name?.trim() || account.login;
  const words = source.split(/[\s-]+/).filter(Boolean);
  const letters = words.length > 1 ? `${words[0]![0]}${words[1]![0]}` : source.slice(0, 2);
  return letters.toUpperCase().replace(/[^A-Z0-9]/g, '') || '?';
}

/** A round badge with the account's initials; the hue follows the id so each account keeps its colour. */
export function avatarSvg(account: FakeGitHubAccount): string {
  const hue = (account.id * 47) % 360;
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" width="96" height="96" viewBox="0 0 96 96">` +
    `<circle cx="48" cy="48" r="48" fill="hsl(${hue} 45% 38%)"/>` +
    `<text x="48" y="60" font-family="sans-serif" font-size="36" font-weight="600" ` +
    `text-anchor="middle" fill="#fff">${initials(account)}</text></svg>`
  );
}

export function avatarDataUri(account: FakeGitHubAccount): string {
  return `data:image/svg+xml;base64,${Buffer.from(avatarSvg(account)).toString('base64')}`;
}
