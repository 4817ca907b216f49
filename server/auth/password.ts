import { randomBytes, scrypt as scryptCb, timingSafeEqual, type ScryptOptions } from 'node:crypto';

const scrypt = (pw: string, salt: Buffer, len: number, opts: ScryptOptions) =>
  new Promise<Buffer>((resolve, reject) =>
    scryptCb(pw, salt, len, opts, (err, key) => (err ? reject(err) : resolve(key))),
  );

// scrypt is memory-hard (RFC 7914). N=2^15, r=8 uses 32 MiB per hash: OWASP Password Storage
// Cheat Sheet's scrypt minimum is N=2^17 at r=8 p=1; tests lower the cost through SCRYPT_LOG_N.
const LOG_N = Number(process.env.SCRYPT_LOG_N ?? (process.env.NODE_ENV === 'test' ? 10 : 15));
const R = 8;
const P = 1;
const KEY_LEN = 32;

/** Hash a secret as `scrypt$logN$r$p$salt$key` (base64). */
export async function hashSecret(secret: string): Promise<string> {
  const salt = randomBytes(16);
  const key = await scrypt(secret, salt, KEY_LEN, { N: 2 ** LOG_N, r: R, p: P, maxmem: 256 * 1024 * 1024 });
  return ['scrypt', LOG_N, R, P, salt.toString('base64'), key.toString('base64')].join('$');
}

/** Constant-time check of a secret against a stored hash; malformed hashes never match. */
export async function verifySecret(secret: string, stored: string | null): Promise<boolean> {
  if (!stored) return false;
  const [kind, logN, r, p, salt, key] = stored.split('$');
  if (kind !== 'scrypt' || !salt || !key) return false;
  const expected = Buffer.from(key, 'base64');
  const actual = await scrypt(secret, Buffer.from(salt, 'base64'), expected.length, {
    N: 2 ** Number(logN),
    r: Number(r),
    p: Number(p),
    maxmem: 256 * 1024 * 1024,
  });
  return actual.length === expected.length && timingSafeEqual(actual, expected);
}
