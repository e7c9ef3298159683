import { randomBytes, scrypt, timingSafeEqual, type ScryptOptions } from 'node:crypto';

/**
 * scrypt (memory-hard KDF, Node's built-in). Parameters travel inside the stored string so
 * they can be raised later without breaking old hashes. OWASP's password-storage cheat sheet
 * recommends N=2^17, r=8, p=1; tests pass a lower cost through configuration.
 */
export interface PasswordHasher {
  hash(password: string): Promise<string>;
  verify(password: string, stored: string): Promise<boolean>;
}

function derive(password: string, salt: Buffer, keylen: number, opts: ScryptOptions): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    scrypt(password.normalize('NFKC'), salt, keylen, opts, (err, key) => (err ? reject(err) : resolve(key)));
  });
}

const maxmemFor = (N: number, r: number) => 256 * N * r;

export function createPasswordHasher(logN = 17): PasswordHasher {
  const N = 2 ** logN;
  const r = 8;
  const p = 1;
  return {
    async hash(password) {
      const salt = randomBytes(16);
      const key = await derive(password, salt, 32, { N, r, p, maxmem: maxmemFor(N, r) });
      return ['scrypt', N, r, p, salt.toString('base64'), key.toString('base64')].join('$');
    },
    async verify(password, stored) {
      const [scheme, n, rs, ps, saltB64, keyB64] = stored.split('$');
      if (scheme !== 'scrypt' || !saltB64 || !keyB64) return false;
      const expected = Buffer.from(keyB64, 'base64');
      const opts = { N: Number(n), r: Number(rs), p: Number(ps), maxmem: maxmemFor(Number(n), Number(rs)) };
      const key = await derive(password, Buffer.from(saltB64, 'base64'), expected.length, opts);
      return timingSafeEqual(key, expected);
    },
  };
}
