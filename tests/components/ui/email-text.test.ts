import { emailBreakParts } from '@/components/ui/email-text';

describe('emailBreakParts', () => {
  it('emailBreakParts, an ordinary address, cuts after the @ only (name and domain stay whole)', () => {
    expect(emailBreakParts('nell.tarrant@example.net')).toEqual(['nell.tarrant@', 'example.net']);
  });

  it('emailBreakParts, a quoted local part with an @ in it, cuts at the last @ (RFC 5321: the domain follows the last @)', () => {
    expect(emailBreakParts('"a@b"@example.org')).toEqual(['"a@b"@', 'example.org']);
  });

  it('emailBreakParts, text without a usable @, is one part', () => {
    expect(emailBreakParts('not-an-address')).toEqual(['not-an-address']);
    expect(emailBreakParts('@example.org')).toEqual(['@example.org']);
    expect(emailBreakParts('someone@')).toEqual(['someone@']);
  });

  it('emailBreakParts, any address, joins back to the same text (nothing added or lost)', () => {
    for (const e of ['x@y.z', 'first.last+tag@sub.example.co.uk']) expect(emailBreakParts(e).join('')).toBe(e);
  });
});
