import { afterSignIn } from '@/components/session/after-sign-in';

describe('afterSignIn', () => {
  it('afterSignIn, a shop request page, goes back to it', () => {
    expect(afterSignIn('/request/larchmere-a1')).toBe('/request/larchmere-a1');
    expect(afterSignIn(['/request/x_9'])).toBe('/request/x_9');
  });

  it('afterSignIn, anything else (another site, a protocol-relative address, a staff page, nothing), goes to the start page', () => {
    for (const next of ['https://elsewhere.example/', '//elsewhere.example', '/players', '/request/../players', '/request/a b', `/request/${'a'.repeat(81)}`, undefined, []]) {
      expect(afterSignIn(next as string | string[] | undefined)).toBe('/');
    }
  });
});
