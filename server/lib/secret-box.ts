import { createCipheriv, createDecipheriv, hkdfSync, randomBytes } from 'node:crypto';

// Small secrets kept at rest (one-time-code secrets) are sealed with
// AES-256-GCM. The key is derived with HKDF-SHA256 from the configured key
// material, with a purpose label, so the same material never serves as two
// keys. `context` (the owning row's id) is bound in as additional data: a
// sealed value copied onto another row does not open there.
const VERSION = 'v1';
const IV_BYTES = 12;

export type SecretBox = {
  seal: (plaintext: string, context: string) => string;
  /** The plaintext, or null when the value was not sealed by this key for this context. */
  open: (sealed: string, context: string) => string | null;
};

export function createSecretBox(keyMaterial: string, purpose: string): SecretBox {
  const key = Buffer.from(hkdfSync('sha256', keyMaterial, 'pourscope secret-box', `${purpose} ${VERSION}`, 32));
  return {
    seal(plaintext, context) {
      const iv = randomBytes(IV_BYTES);
      const cipher = createCipheriv('aes-256-gcm', key, iv);
      cipher.setAAD(Buffer.from(context, 'utf8'));
      const ciphertext = Buffer.concat([cipher.update(plaintext, 'utf8'), cipher.final()]);
      const tag = cipher.getAuthTag();
      return [VERSION, iv, tag, ciphertext].map((p) => (typeof p === 'string' ? p : p.toString('base64url'))).join('.');
    },
    open(sealed, context) {
      const [version, iv, tag, ciphertext] = sealed.split('.');
      if (version !== VERSION || !iv || !tag || ciphertext === undefined) return null;
      try {
        const decipher = createDecipheriv('aes-256-gcm', key, Buffer.from(iv, 'base64url'));
        decipher.setAAD(Buffer.from(context, 'utf8'));
        decipher.setAuthTag(Buffer.from(tag, 'base64url'));
        return Buffer.concat([decipher.update(Buffer.from(ciphertext, 'base64url')), decipher.final()]).toString('utf8');
      } catch {
        // A wrong key, another row's value or a tampered one: GCM refuses it.
        return null;
      }
    },
  };
}
