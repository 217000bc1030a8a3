// Every privileged change carries a reason, which the audit log keeps next to who did it. The API
// requires one of at least three characters for role changes and bans; the client asks for the same
// on every edit, so the log never has an empty "why". edit-reason.test.ts holds this to the contract.

export const reasonMaxLength = 500;
const reasonMinLength = 3;

/** What is wrong with a typed reason, or undefined when it will do. */
export function reasonProblem(text: string): string | undefined {
  const trimmed = text.trim();
  if (trimmed.length < reasonMinLength) return 'Say why, in a few words.';
  if (trimmed.length > reasonMaxLength)
    return `Keep the reason to ${reasonMaxLength} characters at most.`;
  return undefined;
}
