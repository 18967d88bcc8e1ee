import { CSRF_HEADER } from '@evenset/contracts';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter, Route, Routes } from 'react-router-dom';
import { ForgotPasswordRoute } from '../../../app/routes/forgot-password';
import { ResetPasswordRoute } from '../../../app/routes/reset-password';
import { setCsrfToken } from '../../../lib/api-client';
import { installFakeFetch, type FakeAnswer } from '../../../testing/fake-fetch';

const SAME_ANSWER = 'If that address belongs to an active account, a link is on its way.';

function fakeServer(path: string, answer: FakeAnswer) {
  return installFakeFetch((request) => {
    if (request.url === '/api/auth/csrf') return { status: 200, body: { csrfToken: 'anon' } };
    if (request.url === path) return answer;
    return { status: 404 };
  });
}

function renderAt(path: string) {
  render(
    <MemoryRouter initialEntries={[path]}>
      <Routes>
        <Route path="/forgot-password" element={<ForgotPasswordRoute />} />
        <Route path="/reset-password" element={<ResetPasswordRoute />} />
      </Routes>
    </MemoryRouter>,
  );
  return userEvent.setup();
}

beforeEach(() => setCsrfToken(null));

describe('forgotten password', () => {
  it('sends the address with the CSRF token and shows the server’s answer', async () => {
    const requests = fakeServer('/api/auth/password-reset', { status: 202, body: { message: SAME_ANSWER } });
    const user = renderAt('/forgot-password');
    await user.type(screen.getByLabelText('E-mail'), ' Someone@Shop.Test ');
    await user.click(screen.getByRole('button', { name: 'Send me a reset link' }));
    expect(await screen.findByRole('status')).toHaveTextContent(SAME_ANSWER);
    const sent = requests.find((r) => r.url === '/api/auth/password-reset');
    expect(sent?.body).toEqual({ email: 'someone@shop.test' });
    expect(sent?.headers[CSRF_HEADER]).toBe('anon');
  });
});

describe('new password from the e-mailed link', () => {
  it('checks the two entries agree before sending anything', async () => {
    const requests = fakeServer('/api/auth/password-reset/confirm', { status: 204 });
    const user = renderAt('/reset-password?token=abc_DEF-123');
    await user.type(screen.getByLabelText('New password'), 'long-enough-1');
    await user.type(screen.getByLabelText('New password again'), 'long-enough-2');
    await user.click(screen.getByRole('button', { name: 'Set new password' }));
    expect(await screen.findByText('The two passwords differ.')).toBeInTheDocument();
    expect(requests.filter((r) => r.url === '/api/auth/password-reset/confirm')).toHaveLength(0);
  });

  it('sends the token from the link with the new password, then says it is done', async () => {
    const requests = fakeServer('/api/auth/password-reset/confirm', { status: 204 });
    const user = renderAt('/reset-password?token=abc_DEF-123');
    await user.type(screen.getByLabelText('New password'), 'long-enough-1');
    await user.type(screen.getByLabelText('New password again'), 'long-enough-1');
    await user.click(screen.getByRole('button', { name: 'Set new password' }));
    expect(await screen.findByRole('status')).toHaveTextContent('Your password is changed');
    expect(requests.find((r) => r.url === '/api/auth/password-reset/confirm')?.body).toEqual({
      token: 'abc_DEF-123',
      password: 'long-enough-1',
    });
  });

  it('shows the server’s refusal of a spent link', async () => {
    const message = 'This reset link has already been used. Ask for a new one from the sign-in page.';
    fakeServer('/api/auth/password-reset/confirm', {
      status: 400,
      body: { code: 'RESET_LINK_REFUSED', message, details: [{ path: 'token', message }] },
    });
    const user = renderAt('/reset-password?token=spent');
    await user.type(screen.getByLabelText('New password'), 'long-enough-1');
    await user.type(screen.getByLabelText('New password again'), 'long-enough-1');
    await user.click(screen.getByRole('button', { name: 'Set new password' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(message);
  });

  it('asks for the link when the page is opened without one', () => {
    renderAt('/reset-password');
    expect(screen.getByText(/This page needs the link from your e-mail/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Set new password' })).not.toBeInTheDocument();
  });
});
