import crypto from 'node:crypto';

/** Tokens for links in mail: random, single-use, only their hash is stored. */
export function newSecretToken(): { token: string; hash: string } {
  const token = crypto.randomBytes(32).toString('base64url');
  return { token, hash: hashSecretToken(token) };
}

export const hashSecretToken = (token: string) => crypto.createHash('sha256').update(token).digest('hex');
