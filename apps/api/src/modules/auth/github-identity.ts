// What Railyard keeps of a GitHub profile. The account key is GitHub's numeric id; the e-mail is kept
// only when GitHub says it is the primary address and verified.
import type { Profile } from 'passport-github2';
import type { GitHubIdentity } from './users.repository';

interface RawEmail {
  value?: string;
  email?: string;
  primary?: boolean;
  verified?: boolean;
}

export function identityFromProfile(profile: Profile): GitHubIdentity {
  const githubId = Number(profile.id);
  if (!Number.isSafeInteger(githubId) || githubId <= 0) {
    throw new Error(`GitHub gave a user id that is not a positive integer: ${String(profile.id)}`);
  }
  const emails = (profile.emails ?? []) as RawEmail[];
  const primary = emails.find((e) => e.primary === true && e.verified === true);
  return {
    githubId,
    login: profile.username ?? String(githubId),
    name: profile.displayName ?? '',
    email: primary?.value ?? primary?.email ?? null,
    avatarUrl: profile.photos?.[0]?.value ?? '',
  };
}

/** RAILYARD_ADMINS: GitHub logins (case-insensitive) or numeric ids, comma-separated. */
export function isConfiguredAdmin(identity: GitHubIdentity, admins: string): boolean {
  const names = admins
    .split(',')
    .map((s) => s.trim().toLowerCase())
    .filter(Boolean);
  return names.includes(identity.login.toLowerCase()) || names.includes(String(identity.githubId));
}
