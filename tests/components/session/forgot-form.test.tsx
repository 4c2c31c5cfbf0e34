import { QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { createQueryClient } from '@/components/queries/query-client';
import { ForgotForm } from '@/components/session/forgot-form';
import { apiAnswer, pageText } from '../../support/render-helpers';

// The answers mocked here follow the API contract of POST /api/auth/forgot (always 204; 429
// TOO_MANY_ATTEMPTS; 400 VALIDATION_FAILED); product rules, no outside source.
function renderForm() {
  render(
    <QueryClientProvider client={createQueryClient()}>
      <ForgotForm />
    </QueryClientProvider>,
  );
}



const fetchMock = jest.fn();
beforeEach(() => {
  fetchMock.mockReset();
  global.fetch = fetchMock as unknown as typeof fetch;
});

describe('ForgotForm', () => {
  it('ForgotForm, e-mail without an @, shows a field error and sends nothing', () => {
    renderForm();
    fireEvent.changeText(screen.getByLabelText('E-mail'), 'nobody');
    fireEvent.press(screen.getByLabelText('Send the link'));
    expect(pageText()).toContain('Enter an e-mail address.');
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('ForgotForm, a 204, confirms with the trimmed lower-case address', async () => {
    fetchMock.mockResolvedValue(apiAnswer(204));
    renderForm();
    fireEvent.changeText(screen.getByLabelText('E-mail'), '  Nell.Tarrant@Example.NET ');
    fireEvent.press(screen.getByLabelText('Send the link'));
    await waitFor(() =>
      expect(pageText()).toContain('If an account uses nell.tarrant@example.net, a link to set a new password is on its way. It works for one hour.'),
    );
    const [url, init] = fetchMock.mock.calls[0] as [string, RequestInit];
    expect(url).toBe('/api/auth/forgot');
    expect((init.headers as Record<string, string>)['x-ovalyard-request']).toBe('1');
    expect(JSON.parse(init.body as string)).toEqual({ email: 'nell.tarrant@example.net' });
    expect(screen.queryByLabelText('Send the link')).toBeNull();
  });

  it('ForgotForm, rate-limited, shows the answer in the page and keeps the form', async () => {
    const message = 'Too many attempts. Wait a few minutes and try again.';
    fetchMock.mockResolvedValue(apiAnswer(429, { error: { code: 'TOO_MANY_ATTEMPTS', message } }));
    renderForm();
    fireEvent.changeText(screen.getByLabelText('E-mail'), 'a@example.test');
    fireEvent.press(screen.getByLabelText('Send the link'));
    await waitFor(() => expect(pageText()).toContain(message));
    expect(pageText()).not.toContain('is on its way');
    expect(screen.getByLabelText('Send the link')).toBeTruthy();
  });
});
