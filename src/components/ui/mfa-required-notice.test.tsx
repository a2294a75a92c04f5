import { screen } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { ApiError } from '#src/lib/api-client.ts';
import { renderWithProviders } from '#src/testing/render.tsx';
import { ErrorPanel } from './error-boundary.tsx';

describe('ErrorPanel', () => {
  test('when a workshop answers 403 mfa-required, then it explains and links to the two-step section of the settings', () => {
    const error = new ApiError({ status: 403, code: 'mfa-required', message: 'This workshop asks its mentors and admins to use two-step sign-in.' });

    renderWithProviders(<ErrorPanel error={error} reset={() => {}} />);

    expect(screen.getByRole('alert')).toHaveTextContent('This workshop asks for two-step sign-in');
    expect(screen.getByRole('link', { name: 'Set up two-step sign-in' })).toHaveAttribute('href', '/settings#two-step');
    expect(screen.queryByRole('button', { name: 'Try again' })).not.toBeInTheDocument();
  });

  test('when any other error arrives, then it offers to try again', () => {
    renderWithProviders(<ErrorPanel error={new ApiError({ status: 500, code: 'internal', message: 'Broken' })} reset={() => {}} />);

    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });
});
