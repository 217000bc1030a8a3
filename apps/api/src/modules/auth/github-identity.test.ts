import type { Profile } from 'passport-github2';
import { describe, expect, it } from 'vitest';
import { identityFromProfile, isConfiguredAdmin } from './github-identity';

function profile(extra: Partial<Profile> & { emails?: unknown[] }): Profile {
  return { provider: 'github', id: '910001', displayName: 'Ada Bench', username: 'ada-bench', profileUrl: '', ...extra } as Profile;
}

// GitHub's REST API: /user/emails lists { email, primary, verified, visibility } (docs.github.com, "List email
// addresses for the authenticated user"); passport-github2 with allRawEmails passes them as { value, primary, verified }.
describe('identityFromProfile', () => {
  it('keys the account on the numeric id and keeps only a primary verified e-mail', () => {
    const id = identityFromProfile(
      profile({
        emails: [
          { value: 'old@example.invalid', primary: false, verified: true },
          { value: 'main@example.invalid', primary: true, verified: true },
        ] as never,
      }),
    );
    expect(id).toMatchObject({ githubId: 910001, login: 'ada-bench', email: 'main@example.invalid' });
  });

  it('keeps no e-mail when the primary one is not verified', () => {
    const id = identityFromProfile(
      profile({
        emails: [
          { value: 'unverified@example.invalid', primary: true, verified: false },
          { value: 'other@example.invalid', primary: false, verified: true },
        ] as never,
      }),
    );
    expect(id.email).toBeNull();
  });

  it('refuses a profile without a numeric id', () => {
    expect(() => identityFromProfile(profile({ id: 'ada' }))).toThrow(/not a positive integer/);
  });
});

describe('isConfiguredAdmin', () => {
  const ada = identityFromProfile(profile({}));
  it('matches a login without regard to case, or the numeric id', () => {
    expect(isConfiguredAdmin(ada, 'someone, ADA-BENCH')).toBe(true);
    expect(isConfiguredAdmin(ada, '910001')).toBe(true);
    expect(isConfiguredAdmin(ada, 'ada')).toBe(false);
    expect(isConfiguredAdmin(ada, '')).toBe(false);
  });
});
