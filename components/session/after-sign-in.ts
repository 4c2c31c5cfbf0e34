/** A shop's request page, the one page a sign-in may send back to (no open redirect). */
const REQUEST_PAGE = /^\/request\/[A-Za-z0-9_-]{1,80}$/;

/**
 * Where to go after signing in: the `next` address when it is a shop's request page, else the
 * start page. O(length of next), bounded by its 90 characters.
 * @example afterSignIn('/request/larchmere-a1') // => '/request/larchmere-a1'
 * @example afterSignIn('https://elsewhere.example/') // => '/'
 */
export function afterSignIn(next: string | string[] | undefined): string {
  const value = Array.isArray(next) ? next[0] : next;
  return typeof value === 'string' && value.length <= 90 && REQUEST_PAGE.test(value) ? value : '/';
}
