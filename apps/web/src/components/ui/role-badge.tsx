// A person's role as a small badge: the word carries it, the tone only repeats it.
import type { UserRole } from '@railyard/shared';

const roleTone: Record<UserRole, string> = {
  member: 'text-ink-muted border-line-strong',
  moderator: 'text-accent bg-accent-soft border-accent/40',
  admin: 'text-caution bg-caution-soft border-caution/40',
};

export function RoleBadge({ role }: { role: UserRole }) {
  return (
    <span
      className={`inline-flex h-5 items-center rounded border px-1.5 text-[11.5px] leading-none font-medium ${roleTone[role]}`}
    >
      {role}
    </span>
  );
}
