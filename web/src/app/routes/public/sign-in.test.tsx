import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { SIGN_IN_ERRORS } from '@core/contracts';
import { renderApp } from '@/testing/test-utils';

describe('sign-in page', () => {
  it('explains a known ?error= code with the shared message', async () => {
    renderApp('/signin?error=unverified_email');
    expect(await screen.findByRole('alert')).toHaveTextContent(SIGN_IN_ERRORS.unverified_email);
  });

  it('still says sign-in failed for a code it does not know, naming it', async () => {
    renderApp('/signin?error=weird_thing');
    expect(await screen.findByRole('alert')).toHaveTextContent('Sign-in did not complete (reason: “weird_thing”)');
  });

  it('shows no error without a code', async () => {
    renderApp('/signin');
    expect(await screen.findByRole('heading', { name: 'Sign in', level: 1 })).toBeInTheDocument();
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it('fills in the address an invitation links with', async () => {
    renderApp('/signin?email=new.teacher%40fernhollow.example');
    expect(await screen.findByLabelText('School e-mail address')).toHaveValue('new.teacher@fernhollow.example');
  });
});
