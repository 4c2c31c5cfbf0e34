import { QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import fc from 'fast-check';
import { createQueryClient } from '@/components/queries/query-client';
import { PASSWORD_MISMATCH, parseResetText, ResetForm } from '@/components/session/reset-form';
import { apiAnswer, pageText } from '../../support/render-helpers';

// The rules checked here are the API contract's (server/schemas/auth.ts, resetBodySchema): a
// password of at least 10 characters, a token of at least 20. Product rules, no outside source.
const TOKEN = 'tok-0123456789abcdefghijklmnop';

function renderForm(onSignIn = jest.fn()) {
  const client = createQueryClient();
  render(
    <QueryClientProvider client={client}>
      <ResetForm token={TOKEN} onSignIn={onSignIn} />
    </QueryClientProvider>,
  );
  return { onSignIn, client };
}


/** The hrefs of the rendered links. */
function linkHrefs(): string[] {
  const out: string[] = [];
  const walk = (node: unknown): void => {
    if (!node || typeof node !== 'object') return;
    if (Array.isArray(node)) return node.forEach(walk);
    const n = node as { type?: string; props?: { href?: string }; children?: unknown };
    if (n.type === 'a' && n.props?.href) out.push(n.props.href);
    walk(n.children);
  };
  walk(screen.toJSON());
  return out;
}


function fill(password: string, confirm: string) {
  fireEvent.changeText(screen.getByLabelText('New password'), password);
  fireEvent.changeText(screen.getByLabelText('New password again'), confirm);
  fireEvent.press(screen.getByLabelText('Set the password'));
}

const fetchMock = jest.fn();
beforeEach(() => {
  fetchMock.mockReset();
  global.fetch = fetchMock as unknown as typeof fetch;
});

describe('parseResetText', () => {
  it('parseResetText, any two different entries, refuses with the mismatch on confirm', () => {
    fc.assert(
      fc.property(fc.string({ minLength: 10, maxLength: 60 }), fc.string({ maxLength: 60 }), (password, confirm) => {
        fc.pre(password !== confirm);
        const result = parseResetText(TOKEN, { password, confirm });
        return !result.ok && result.errors.confirm === PASSWORD_MISMATCH;
      }),
    );
  });

  it('parseResetText, equal entries of 10 to 200 characters, gives the token and password', () => {
    fc.assert(
      fc.property(fc.string({ minLength: 10, maxLength: 200 }), (password) => {
        const result = parseResetText(TOKEN, { password, confirm: password });
        return result.ok && result.body.password === password && result.body.token === TOKEN;
      }),
    );
  });

  it('parseResetText, equal entries under 10 characters, refuses on password', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 9 }), (password) => {
        const result = parseResetText(TOKEN, { password, confirm: password });
        return !result.ok && typeof result.errors.password === 'string' && result.errors.confirm === undefined;
      }),
    );
  });

  it('parseResetText, a cut-short token, refuses on token', () => {
    const result = parseResetText('short', { password: 'a new long password', confirm: 'a new long password' });
    expect(result.ok).toBe(false);
    expect(!result.ok && result.errors.token).toBe('This link is incomplete.');
  });
});

describe('ResetForm', () => {
  it('ResetForm, the two entries differ, says so inline and sends nothing', () => {
    renderForm();
    fill('a new long password', 'a new long passwort');
    expect(pageText()).toContain(PASSWORD_MISMATCH);
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('ResetForm, 9 characters twice, says the minimum inline and sends nothing', () => {
    renderForm();
    fill('123456789', '123456789');
    expect(pageText()).toContain('A password needs at least 10 characters.');
    expect(pageText()).not.toContain(PASSWORD_MISMATCH);
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('ResetForm, 10 characters twice and a 204, posts them and offers sign-in', async () => {
    fetchMock.mockResolvedValue(apiAnswer(204));
    const { onSignIn } = renderForm();
    fill('1234567890', '1234567890');
    await waitFor(() => expect(pageText()).toContain('Your password is set. Sign in with it.'));
    const [url, init] = fetchMock.mock.calls[0] as [string, RequestInit];
    expect(url).toBe('/api/auth/reset');
    expect((init.headers as Record<string, string>)['x-ovalyard-request']).toBe('1');
    expect(JSON.parse(init.body as string)).toEqual({ token: TOKEN, password: '1234567890' });
    fireEvent.press(screen.getByLabelText('Sign in'));
    expect(onSignIn).toHaveBeenCalledTimes(1);
  });

  it('ResetForm, a used or expired link, shows the answer and a way to a new link', async () => {
    const message = 'This link has expired or was already used. Ask for a new one.';
    fetchMock.mockResolvedValue(apiAnswer(400, { error: { code: 'RESET_LINK_INVALID', message } }));
    renderForm();
    fill('a new long password', 'a new long password');
    await waitFor(() => expect(pageText()).toContain(message));
    expect(linkHrefs()).toContain('/forgot');
    expect(pageText()).not.toContain('Your password is set');
  });

  it('ResetForm, the server refuses the password, shows its message under the field', async () => {
    const details = [{ path: ['password'], message: 'A password needs at least 10 characters.' }];
    fetchMock.mockResolvedValue(apiAnswer(400, { error: { code: 'VALIDATION_FAILED', message: 'Check the fields.', details } }));
    renderForm();
    fill('a new long password', 'a new long password');
    await waitFor(() => expect(pageText()).toContain('A password needs at least 10 characters.'));
    expect(pageText()).not.toContain('Check the fields.');
  });
});
