import { CSRF_HEADER } from '@evenset/contracts';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter, Route, Routes, useLocation } from 'react-router-dom';
import { SWRConfig } from 'swr';
import { SignInRoute } from '../../../app/routes/sign-in';
import { setCsrfToken } from '../../../lib/api-client';
import { installFakeFetch, type FakeAnswer } from '../../../testing/fake-fetch';
import { AuthProvider } from './auth-provider';

const session = {
  user: { id: 'u1', email: 'admin@kestrel.example', displayName: 'Morgan Pell', roles: ['admin'], displayUnit: 'in' },
  csrfToken: 'after-login',
};

/** Nobody is signed in; the login answer is up to each test. */
function fakeServer(loginAnswer: FakeAnswer) {
  return installFakeFetch((request) => {
    if (request.url === '/api/auth/me')
      return { status: 401, body: { code: 'AUTH_REQUIRED', message: 'Sign in first.' } };
    if (request.url === '/api/auth/csrf') return { status: 200, body: { csrfToken: 'before-login' } };
    if (request.url === '/api/auth/login') return loginAnswer;
    return { status: 404 };
  });
}

function Arrived() {
  const location = useLocation();
  return <p>Arrived at {`${location.pathname}${location.search}`}</p>;
}

// A plain MemoryRouter: jsdom lacks the Request class a data router builds on every navigation.
function renderSignIn(path = '/sign-in') {
  render(
    <SWRConfig value={{ provider: () => new Map(), shouldRetryOnError: false }}>
      <AuthProvider>
        <MemoryRouter initialEntries={[path]}>
          <Routes>
            <Route path="/sign-in" element={<SignInRoute />} />
            <Route path="*" element={<Arrived />} />
          </Routes>
        </MemoryRouter>
      </AuthProvider>
    </SWRConfig>,
  );
  return userEvent.setup();
}

async function signIn(user: ReturnType<typeof userEvent.setup>, email: string, password: string) {
  await user.type(await screen.findByLabelText('E-mail'), email);
  await user.type(screen.getByLabelText('Password'), password);
  await user.click(screen.getByRole('button', { name: 'Sign in' }));
}

beforeEach(() => setCsrfToken(null));

describe('the sign-in page', () => {
  it('shows what is missing on the fields and sends nothing', async () => {
    const requests = fakeServer({ status: 500 });
    const user = renderSignIn();
    await user.click(await screen.findByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter your e-mail address.')).toBeInTheDocument();
    expect(screen.getByText('Enter your password.')).toBeInTheDocument();
    expect(screen.getByLabelText('E-mail')).toHaveAttribute('aria-invalid', 'true');
    expect(requests.some((request) => request.url === '/api/auth/login')).toBe(false);
  });

  it('says "Wrong e-mail or password." and puts the person back on the password', async () => {
    const requests = fakeServer({ status: 401, body: { code: 'AUTH_INVALID', message: 'Wrong e-mail or password.' } });
    const user = renderSignIn();
    await signIn(user, 'admin@kestrel.example', 'not-the-password');
    expect(await screen.findByRole('alert')).toHaveTextContent('Wrong e-mail or password.');
    expect(screen.getByLabelText('Password')).toHaveFocus();
    expect(screen.getByLabelText('E-mail')).toHaveValue('admin@kestrel.example');
    const login = requests.find((request) => request.url === '/api/auth/login');
    expect(login?.headers[CSRF_HEADER]).toBe('before-login');
  });

  it('tells a throttled person to wait', async () => {
    fakeServer({
      status: 429,
      body: { code: 'TOO_MANY_ATTEMPTS', message: 'Too many attempts — wait a minute and try again.' },
    });
    const user = renderSignIn();
    await signIn(user, 'admin@kestrel.example', 'guess-number-six');
    expect(await screen.findByRole('alert')).toHaveTextContent('Too many attempts — wait a minute and try again.');
  });

  it('signs in and returns to the page that was asked for', async () => {
    fakeServer({ status: 200, body: session });
    const user = renderSignIn('/sign-in?next=%2Fpeople%3Fq%3Dana');
    await signIn(user, 'admin@kestrel.example', 'evenset-demo-1');
    expect(await screen.findByText('Arrived at /people?q=ana')).toBeInTheDocument();
  });

  it('never follows a next address that leads off this site', async () => {
    fakeServer({ status: 200, body: session });
    const user = renderSignIn('/sign-in?next=%2F%2Fevil.example');
    await signIn(user, 'admin@kestrel.example', 'evenset-demo-1');
    expect(await screen.findByText('Arrived at /')).toBeInTheDocument();
  });
});
