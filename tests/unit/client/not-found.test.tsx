import { render, screen } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { describe, expect, it } from 'vitest';
import { Component as NotFound } from '@client/app/routes/not-found';

describe('not-found page', () => {
  it('when a route is unknown, then it names the address and offers the tanks, the questions and home', async () => {
    const router = createMemoryRouter([{ path: '*', element: <NotFound /> }], { initialEntries: ['/tankz'] });
    render(<RouterProvider router={router} />);
    expect(
      await screen.findByRole('heading', { name: 'There is nothing at this address' }),
    ).toBeInTheDocument();
    expect(screen.getByText('/tankz')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Go to my tanks' })).toHaveAttribute('href', '/tanks');
    expect(screen.getByRole('link', { name: 'My questions' })).toHaveAttribute('href', '/questions');
    expect(screen.getByRole('link', { name: 'Home' })).toHaveAttribute('href', '/');
    expect(document.title).toBe('Page not found · Shoalwise');
  });
});
