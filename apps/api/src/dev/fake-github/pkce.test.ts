import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { isWellFormedPkceValue, s256Challenge, verifierMatchesChallenge } from './pkce';

// RFC 7636 Appendix B, the worked S256 example (verifier built from the 32 octets listed there).
const rfcOctets = [
  116, 24, 223, 180, 151, 153, 224, 37, 79, 250, 96, 125, 216, 173, 187, 186, 22, 212, 37, 77, 105,
  214, 191, 240, 91, 88, 5, 88, 83, 132, 141, 121,
];
const rfcVerifier = 'dBjftJeZ4CVP-mB92K27uhbUJU1p1r_wW1gFWFOEjXk';
const rfcChallenge = 'E9Melhoa2OwvFrEMTJguCHaoeK1t8URWbuGJSstw-cM';
const rfcDigest = [
  19, 211, 30, 150, 26, 26, 216, 236, 47, 22, 177, 12, 76, 152, 46, 8, 118, 168, 120, 173, 109, 241,
  68, 86, 110, 225, 137, 74, 203, 112, 249, 195,
];

describe('PKCE (RFC 7636)', () => {
  it('the Appendix B verifier is the base64url encoding of the listed octets', () => {
    // RFC 7636 Appendix B: "Encoding this octet sequence as base64url provides the value of the code_verifier"
    expect(Buffer.from(rfcOctets).toString('base64url')).toBe(rfcVerifier);
  });

  it('the S256 challenge of the Appendix B verifier is the one printed in the RFC', () => {
    // RFC 7636 Appendix B: SHA256 of the verifier gives the listed digest, and its base64url is the challenge
    expect([...createHash('sha256').update(rfcVerifier).digest()]).toEqual(rfcDigest);
    expect(s256Challenge(rfcVerifier)).toBe(rfcChallenge);
  });

  it('accepts the Appendix B verifier against its challenge and refuses a verifier one character off', () => {
    expect(verifierMatchesChallenge(rfcVerifier, rfcChallenge, 'S256')).toBe(true);
    const tampered = `${rfcVerifier.slice(0, -1)}Y`;
    expect(verifierMatchesChallenge(tampered, rfcChallenge, 'S256')).toBe(false);
  });

  it('with the plain method the verifier must equal the challenge (RFC 7636 §4.2)', () => {
    expect(verifierMatchesChallenge(rfcVerifier, rfcVerifier, 'plain')).toBe(true);
    expect(verifierMatchesChallenge(rfcVerifier, rfcChallenge, 'plain')).toBe(false);
  });

  it('refuses verifiers shorter than 43 or longer than 128 characters, or with other characters (RFC 7636 §4.1)', () => {
    expect(isWellFormedPkceValue('a'.repeat(43))).toBe(true);
    expect(isWellFormedPkceValue('a'.repeat(128))).toBe(true);
    expect(isWellFormedPkceValue('a'.repeat(42))).toBe(false);
    expect(isWellFormedPkceValue('a'.repeat(129))).toBe(false);
    expect(isWellFormedPkceValue(`${'a'.repeat(42)}+`)).toBe(false);
    // a short verifier is refused even under plain, where it would equal its own challenge
    expect(verifierMatchesChallenge('short', 'short', 'plain')).toBe(false);
  });
});
