import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderApp } from '@/testing/test-utils';

describe('not-found page', () => {
  it('names the address that has no page and links to the start page', async () => {
    renderApp('/lessons/nowhere');
    expect(await screen.findByRole('heading', { name: 'Page not found' })).toBeInTheDocument();
    expect(screen.getByText('/lessons/nowhere')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Go to Pinfield’s start page' })).toHaveAttribute('href', '/');
  });
});
