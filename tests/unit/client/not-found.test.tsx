import { render, screen } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { describe, expect, it } from 'vitest';
import { Component as NotFound } from '@client/app/routes/not-found';

describe('not-found page', () => {
  it('when a route is unknown, then it says so and links home', async () => {
    const router = createMemoryRouter([{ path: '*', element: <NotFound /> }], { initialEntries: ['/nowhere'] });
    render(<RouterProvider router={router} />);
    expect(await screen.findByRole('heading', { name: /couldn't find that page/i })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: /back to the start/i })).toHaveAttribute('href', '/');
  });
});
