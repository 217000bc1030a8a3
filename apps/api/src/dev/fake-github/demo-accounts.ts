// Invented people for local sign-in. Railyard's seed gives these GitHub ids their roles; the fake
// provider only knows who they are. Addresses use the reserved example domains of RFC 2606.
//
// Real GitHub also has users with these ids: the seed must never grant roles by these ids on a
// deployment that signs in with real GitHub.
import type { FakeGitHubAccount } from './github-account';

export const demoAccountIds = {
  member: 910001,
  moderator: 910002,
  adminToBe: 910003,
  secondMember: 910004,
  unverifiedPrimary: 910005,
} as const;

export const demoAccounts: readonly FakeGitHubAccount[] = [
  {
    id: demoAccountIds.member,
    login: 'tamsin-reyl',
    name: 'Tamsin Reyl',
    description: 'Bench technician, ordinary member; public e-mail on the profile',
    emails: [
      { email: 'tamsin.reyl@example.com', primary: true, verified: true, visibility: 'public' },
    ],
  },
  {
    id: demoAccountIds.moderator,
    login: 'oskar-brandvik',
    name: 'Oskar Brandvik',
    description: 'Senior technician who moderates write-ups; private e-mail, two addresses',
    emails: [
      { email: 'oskar@example.org', primary: true, verified: true, visibility: 'private' },
      { email: 'o.brandvik@example.net', primary: false, verified: true, visibility: null },
    ],
  },
  {
    id: demoAccountIds.adminToBe,
    login: 'ines-harlow',
    name: 'Ines Harlow',
    description: 'Workshop lead who becomes the administrator',
    emails: [
      { email: 'ines.harlow@example.com', primary: true, verified: true, visibility: 'private' },
    ],
  },
  {
    id: demoAccountIds.secondMember,
    login: 'pelle-marwick',
    name: null,
    description: 'Second member, no display name set (GitHub gives name: null)',
    emails: [{ email: 'pelle@example.net', primary: true, verified: true, visibility: 'private' }],
  },
  {
    id: demoAccountIds.unverifiedPrimary,
    login: 'yara-quill',
    name: 'Yara Quill',
    description: 'Primary e-mail not yet verified; a verified secondary address',
    emails: [
      { email: 'yara.quill@example.com', primary: true, verified: false, visibility: 'private' },
      { email: 'yq@example.org', primary: false, verified: true, visibility: null },
    ],
  },
];
