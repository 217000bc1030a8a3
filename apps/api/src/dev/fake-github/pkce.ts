// Proof Key for Code Exchange (RFC 7636) as the fake GitHub checks it at the token endpoint.
import { createHash, timingSafeEqual } from 'node:crypto';

export type PkceMethod = 'S256' | 'plain';

// RFC 7636 §4.1 (code_verifier) and §4.2 (code_challenge) share one ABNF: 43*128 unreserved characters.
const pkceValuePattern = /^[A-Za-z0-9\-._~]{43,128}$/;

export function isWellFormedPkceValue(value: string): boolean {
  return pkceValuePattern.test(value);
}

/** RFC 7636 §4.2: code_challenge = BASE64URL-ENCODE(SHA256(ASCII(code_verifier))), unpadded (Appendix A). */
export function s256Challenge(verifier: string): string {
  return createHash('sha256').update(verifier, 'ascii').digest('base64url');
}

/** RFC 7636 §4.6: transform the verifier by the recorded method and compare with the stored challenge. */
export function verifierMatchesChallenge(
  verifier: string,
  challenge: string,
  method: PkceMethod,
): boolean {
  if (!isWellFormedPkceValue(verifier)) return false;
  const derived = Buffer.from(method === 'S256' ? s256Challenge(verifier) : verifier, 'ascii');
  const expected = Buffer.from(challenge, 'ascii');
  // lengths differ only when the values differ; the length itself is not secret
  return derived.length === expected.length && timingSafeEqual(derived, expected);
}
