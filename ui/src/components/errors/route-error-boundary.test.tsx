import { describe, expect, it } from 'vitest';
import { screen } from '@testing-library/react';
import { data } from 'react-router-dom';
import { RootErrorBoundary } from '../../app/routes/root-error';
import { ApiRequestError } from '../../lib/api-error';
import { renderRoutes } from '../../testing/render';
import { describeRouteError, RouteErrorBoundary } from './route-error-boundary';

function thrower(value: unknown) {
  return () => {
    throw value;
  };
}

describe('describeRouteError', () => {
  it('names route responses, API errors and plain errors', () => {
    expect(
      describeRouteError(new ApiRequestError(404, 'not_found', 'No sheet HF-9')),
    ).toMatchObject({
      status: 404,
      title: 'Not found',
      message: 'No sheet HF-9',
    });
    expect(
      describeRouteError(new ApiRequestError(403, 'forbidden', 'Checkers only')),
    ).toMatchObject({
      title: 'Not allowed',
    });
    expect(describeRouteError(new Error('kaput'))).toMatchObject({ message: 'kaput' });
    expect(describeRouteError('a string')).toBeNull();
  });
});

describe('error boundaries', () => {
  it('shows route responses thrown by loaders in the nested boundary', async () => {
    renderRoutes([
      {
        path: '/',
        ErrorBoundary: RouteErrorBoundary,
        loader: () => {
          throw data('Only checkers return sheets.', { status: 403 });
        },
        element: <p>never</p>,
      },
    ]);
    expect(await screen.findByRole('heading', { name: 'Not allowed' })).toBeInTheDocument();
    expect(screen.getByText('Only checkers return sheets.')).toBeInTheDocument();
  });

  it('passes values it does not know up to the root boundary', async () => {
    renderRoutes([
      {
        path: '/',
        ErrorBoundary: RootErrorBoundary,
        children: [{ index: true, ErrorBoundary: RouteErrorBoundary, Component: thrower(42) }],
      },
    ]);
    expect(
      await screen.findByRole('heading', { name: 'Something went wrong' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Reload' })).toBeInTheDocument();
  });
});
