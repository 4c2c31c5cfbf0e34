import { Fragment, createElement, type ReactNode } from 'react';
import { Platform, type TextProps } from 'react-native';
import { AppText } from './app-text';

type EmailTextProps = Omit<TextProps, 'children'> & { email: string; variant?: 'body' | 'caption'; tone?: 'default' | 'muted' };

/**
 * The points where a long e-mail address may wrap: after the "@" and before each "." (never
 * inside a name). Pure. O(length).
 * @example emailBreakParts('nell.tarrant@example.net') // => ['nell', '.tarrant@', 'example', '.net']
 */
export function emailBreakParts(email: string): string[] {
  const parts: string[] = [];
  let current = '';
  for (const ch of email) {
    if (ch === '.' && current !== '') {
      parts.push(current);
      current = '';
    }
    current += ch;
    if (ch === '@') {
      parts.push(current);
      current = '';
    }
  }
  if (current !== '') parts.push(current);
  return parts;
}

/**
 * An e-mail address that wraps on a narrow screen at its "@" and dots rather than mid-word.
 * On the web the break points are <wbr> elements: nothing is added to the text a user copies.
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
