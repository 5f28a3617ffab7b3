import { describe, expect, it } from 'vitest';
import { screen } from '@testing-library/react';
import { renderRoutes } from '../../../testing/render';
import { Component as VerifyPage } from './verify-page';

describe('verify page', () => {
  it('refuses a malformed code in a sentence under the box, the box keeping its label', async () => {
    const { user } = renderRoutes([{ path: '/verify/:code?', Component: VerifyPage }], {
      route: '/verify',
    });
    const box = await screen.findByRole('textbox', { name: 'Verification code' });
    await user.type(box, 'abcd-1234');
    await user.click(screen.getByRole('button', { name: 'Check' }));
    const error = await screen.findByText(/^A verification code is/);
    expect(error.id).not.toBe('');
    expect(box).toHaveAttribute('aria-describedby', expect.stringContaining(error.id));
    expect(box).toHaveAttribute('aria-invalid', 'true');
  });
});
