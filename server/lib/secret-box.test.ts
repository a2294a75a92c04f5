import { describe, expect, test } from 'vitest';
import { createSecretBox } from './secret-box.ts';

const MATERIAL = 'k'.repeat(40);

describe('createSecretBox', () => {
  test('when a value is sealed, then it opens for the same context and never shows the plaintext', () => {
    const box = createSecretBox(MATERIAL, 'totp-secret');

    const sealed = box.seal('JBSWY3DPEHPK3PXPJBSWY3DPEHPK3PXP', 'user:1');

    expect(sealed).toMatch(/^v1\.[\w-]+\.[\w-]+\.[\w-]+$/);
    expect(sealed).not.toContain('JBSWY3DP');
    expect(box.open(sealed, 'user:1')).toBe('JBSWY3DPEHPK3PXPJBSWY3DPEHPK3PXP');
  });

  test('when sealing twice, then the values differ (a new IV each time)', () => {
    const box = createSecretBox(MATERIAL, 'totp-secret');
    expect(box.seal('same', 'user:1')).not.toBe(box.seal('same', 'user:1'));
  });

  test('when the context, the key, the purpose or a byte differs, then it does not open', () => {
    const box = createSecretBox(MATERIAL, 'totp-secret');
    const sealed = box.seal('secret', 'user:1');
    const [v, iv, tag, ct] = sealed.split('.');
    const flipped = `${v}.${iv}.${tag}.${ct.startsWith('A') ? `B${ct.slice(1)}` : `A${ct.slice(1)}`}`;

    expect(box.open(sealed, 'user:2')).toBeNull();
    expect(createSecretBox('z'.repeat(40), 'totp-secret').open(sealed, 'user:1')).toBeNull();
    expect(createSecretBox(MATERIAL, 'other-purpose').open(sealed, 'user:1')).toBeNull();
    expect(box.open(flipped, 'user:1')).toBeNull();
    expect(box.open('garbage', 'user:1')).toBeNull();
  });
});
