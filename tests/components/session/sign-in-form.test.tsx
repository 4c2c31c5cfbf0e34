import { QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { SignInForm } from '@/components/session/sign-in-form';
import { createQueryClient } from '@/components/queries/query-client';
import { apiAnswer, pageText } from '../../support/render-helpers';

function renderForm(onSignedIn = jest.fn(), demo = false) {
  const client = createQueryClient();
  render(
    <QueryClientProvider client={client}>
      <SignInForm onSignedIn={onSignedIn} demo={demo} />
    </QueryClientProvider>,
  );
  return { onSignedIn, client };
}

/**
 * All text of the rendered tree. With react-native-web (the web preset) text renders as DOM
 * host elements, which the Text-based queries of @testing-library/react-native do not see.
 */


const fetchMock = jest.fn();
beforeEach(() => {
  fetchMock.mockReset();
  global.fetch = fetchMock as unknown as typeof fetch;
});

describe('SignInForm', () => {
  it('SignInForm, wrong password, shows the refusal in the page', async () => {
    fetchMock.mockResolvedValue(apiAnswer(401, { error: { code: 'BAD_CREDENTIALS', message: 'E-mail or password is wrong.' } }));
    const { onSignedIn } = renderForm();
    fireEvent.changeText(screen.getByLabelText('E-mail'), 'Someone@Example.test');
    fireEvent.changeText(screen.getByLabelText('Password'), 'not-it');
    fireEvent.press(screen.getByLabelText('Sign in'));
    await waitFor(() => expect(pageText()).toMatch(/do not match/));
    expect(onSignedIn).not.toHaveBeenCalled();
    const [url, init] = fetchMock.mock.calls[0] as [string, RequestInit];
    expect(url).toBe('/api/auth/sign-in');
    expect(init.credentials).toBe('include');
    expect((init.headers as Record<string, string>)['x-ovalyard-request']).toBe('1');
    expect(JSON.parse(init.body as string)).toEqual({ email: 'someone@example.test', password: 'not-it' });
  });

  it('SignInForm, e-mail without an @, shows a field error and sends nothing', () => {
    renderForm();
    fireEvent.changeText(screen.getByLabelText('E-mail'), 'nobody');
    fireEvent.changeText(screen.getByLabelText('Password'), 'x');
    fireEvent.press(screen.getByLabelText('Sign in'));
    expect(pageText()).toContain('Enter an e-mail address.');
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('SignInForm, right password, records the user and calls onSignedIn', async () => {
    const user = { id: 'u1', email: 'a@example.test', name: 'A', role: 'fitter', shop: { id: 's', name: 'S' }, playerId: null, units: 'metric' };
    fetchMock.mockResolvedValue(apiAnswer(200, { user }));
    const { onSignedIn, client } = renderForm();
    fireEvent.changeText(screen.getByLabelText('E-mail'), 'a@example.test');
    fireEvent.changeText(screen.getByLabelText('Password'), 'secret');
    fireEvent.press(screen.getByLabelText('Sign in'));
    await waitFor(() => expect(onSignedIn).toHaveBeenCalledTimes(1));
    expect(client.getQueryData(['me'])).toEqual(user);
  });

  it('SignInForm, signed out, links to the forgotten-password screen', () => {
    renderForm();
    const json = JSON.stringify(screen.toJSON());
    expect(json).toContain('"href":"/forgot"');
    expect(pageText()).toContain('Forgot your password?');
  });

  it('SignInForm, a refusal and then the fields emptied, drops the old refusal and shows only the field errors', async () => {
    fetchMock.mockResolvedValue(apiAnswer(401, { error: { code: 'BAD_CREDENTIALS', message: 'E-mail or password is wrong.' } }));
    renderForm();
    fireEvent.changeText(screen.getByLabelText('E-mail'), 'someone@example.test');
    fireEvent.changeText(screen.getByLabelText('Password'), 'not-it');
    fireEvent.press(screen.getByLabelText('Sign in'));
    await waitFor(() => expect(pageText()).toMatch(/do not match/));
    fireEvent.changeText(screen.getByLabelText('Password'), '');
    expect(pageText()).not.toMatch(/do not match/);
    fireEvent.changeText(screen.getByLabelText('E-mail'), '');
    fireEvent.press(screen.getByLabelText('Sign in'));
    expect(pageText()).toContain('Enter an e-mail address.');
    expect(pageText()).toContain('Enter your password.');
    expect(pageText()).not.toMatch(/do not match/);
    expect(fetchMock).toHaveBeenCalledTimes(1);
  });

  it('SignInForm, no demo loaded, shows no demo sign-ins and leaves the fields empty', () => {
    renderForm(jest.fn(), false);
    expect(pageText()).not.toMatch(/Demo|larchmere|ovalyard-demo/);
    expect(screen.getByLabelText('E-mail').props.value).toBe('');
    expect(screen.getByLabelText('Password').props.value).toBe('');
  });

  it('SignInForm, the demo loaded, lists the demo sign-ins and fills in the fitter’s', () => {
    renderForm(jest.fn(), true);
    expect(pageText()).toContain('oskar@larchmere.example');
    expect(pageText()).toContain('hedda@larchmere.example');
    expect(screen.getByLabelText('E-mail').props.value).toBe('oskar@larchmere.example');
    expect(screen.getByLabelText('Password').props.value).toBe('ovalyard-demo');
  });
});
