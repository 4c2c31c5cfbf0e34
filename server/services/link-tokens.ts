/** One-use e-mailed links: 32 random bytes in the link, only their SHA-256 stored. */
import { createHash, randomBytes } from 'node:crypto';

export const sha256Hex = (text: string) => createHash('sha256').update(text).digest('hex');

/** A fresh token for a link and the hash to store. */
export function newLinkToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: sha256Hex(token) };
}

/** The app's address with a path ("https://fit.example.com" + "/verify?token=…"). */
export const appLink = (appUrl: string, path: string) => `${appUrl.replace(/\/$/, '')}${path}`;
