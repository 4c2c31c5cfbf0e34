import { Fragment, createElement, type ReactNode } from 'react';
import { Platform, type TextProps } from 'react-native';
import { AppText } from './app-text';

type EmailTextProps = Omit<TextProps, 'children'> & { email: string; variant?: 'body' | 'caption'; tone?: 'default' | 'muted' };

/**
 * An e-mail address cut where it may wrap: after the "@", so the name and the domain each stay
 * whole (a part too long for a line alone still wraps where the browser must). Pure. O(length).
 * @example emailBreakParts('nell.tarrant@example.net') // => ['nell.tarrant@', 'example.net']
 */
export function emailBreakParts(email: string): string[] {
  const at = email.lastIndexOf('@');
  if (at <= 0 || at === email.length - 1) return [email];
  return [email.slice(0, at + 1), email.slice(at + 1)];
}

/**
 * An e-mail address that wraps on a narrow screen after its "@" rather than mid-word. On the
 * web the break point is a <wbr> element: nothing is added to the text a user copies.
 */
export function EmailText({ email, ...rest }: EmailTextProps) {
  if (Platform.OS !== 'web') return <AppText {...rest}>{email}</AppText>;
  const children: ReactNode[] = emailBreakParts(email).map((part, i) => (
    <Fragment key={i}>
      {i > 0 ? createElement('wbr') : null}
      {part}
    </Fragment>
  ));
  return <AppText {...rest}>{children}</AppText>;
}
