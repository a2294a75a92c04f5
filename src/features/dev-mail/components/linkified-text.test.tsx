import { render, screen } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { LinkifiedText } from './linkified-text.tsx';

describe('LinkifiedText', () => {
  test('when the text holds an address, then it becomes a link without the sentence’s full stop', () => {
    render(<LinkifiedText text="Join here: http://127.0.0.1:5173/invitations/abc_123. Thanks" />);
    expect(screen.getByRole('link')).toHaveAttribute('href', 'http://127.0.0.1:5173/invitations/abc_123');
    expect(document.body).toHaveTextContent('Join here: http://127.0.0.1:5173/invitations/abc_123. Thanks');
  });
});
