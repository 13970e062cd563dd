import { hkdfSync, randomUUID } from 'node:crypto';
import { EncryptJWT, jwtDecrypt } from 'jose';
import type { JWT, JWTDecodeParams, JWTEncodeParams } from 'next-auth/jwt';

/**
 * The session cookie's codec, the same token format as next-auth's default (JWE, direct key,
 * A256GCM, the key derived from the secret by HKDF-SHA256 with next-auth's info string), so
 * cookies issued before and after it are interchangeable. Unlike the default it derives the key
 * once per secret instead of twice a request (decode and re-encode): the derivation was the
 * largest single cost of a signed-in API request.
 */
const keys = new Map<string, Uint8Array>();

/** How long a session cookie lasts from its last renewal, seconds (one working shift). */
export const SESSION_MAX_AGE = 8 * 3600;

function keyOf(secret: string | Buffer, salt: string): Uint8Array {
  const id = `${salt}\u0000${secret.toString()}`;
  let key = keys.get(id);
  if (!key) {
    const info = `NextAuth.js Generated Encryption Key${salt ? ` (${salt})` : ''}`;
    key = new Uint8Array(hkdfSync('sha256', secret, salt, info, 32));
    keys.set(id, key);
  }
  return key;
}

const now = () => Math.floor(Date.now() / 1000);

export async function encodeSessionToken({
  token,
  secret,
  maxAge = SESSION_MAX_AGE,
  salt = '',
}: JWTEncodeParams): Promise<string> {
  return new EncryptJWT({ ...token })
    .setProtectedHeader({ alg: 'dir', enc: 'A256GCM' })
    .setIssuedAt()
    .setExpirationTime(now() + maxAge)
    .setJti(randomUUID())
    .encrypt(keyOf(secret, salt));
}

/** The token's claims; throws on a token that is forged, damaged or expired (15 s leeway). */
export async function decodeSessionToken({
  token,
  secret,
  salt = '',
}: JWTDecodeParams): Promise<JWT | null> {
  if (!token) return null;
  const { payload } = await jwtDecrypt(token, keyOf(secret, salt), { clockTolerance: 15 });
  return payload as JWT;
}
