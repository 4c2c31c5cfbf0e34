/**
 * Helpers for component tests on the jest-expo web preset, where react-native-web renders DOM
 * host elements: testIDs arrive as data-testid and the Text queries do not see DOM text.
 */
import { screen } from '@testing-library/react-native';

/** Host elements with this testID. */
export const byWebTestId = (id: string) => screen.UNSAFE_root.findAll((n) => typeof n.type === 'string' && n.props['data-testid'] === id);

/** All text of the rendered tree. */
export function pageText(): string {
  const walk = (node: unknown): string => {
    if (node === null || node === undefined) return '';
    if (typeof node === 'string') return node;
    if (Array.isArray(node)) return node.map(walk).join(' ');
    const children = (node as { children?: unknown }).children;
    return children ? walk(children) : '';
  };
  return walk(screen.toJSON());
}

/** A fetch Response of the API: a status and a JSON body (none for 204). */
export function apiAnswer(status: number, body?: unknown): Response {
  return { ok: status >= 200 && status < 300, status, text: async () => (body === undefined ? '' : JSON.stringify(body)) } as Response;
}
