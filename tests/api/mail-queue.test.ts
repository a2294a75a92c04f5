import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { insertUser } from '../factories/people.ts';
import { mailProxy, mailsTo, waitForMail } from '../support/mail.ts';
import { browser, startApp, type TestApp } from '../support/test-app.ts';

let t: TestApp;
beforeAll(() => {
  t = startApp();
});
afterAll(() => t.close());

describe('queued mail', () => {
  test('when the mail server is down, then the request still succeeds and the mail arrives once it is back, exactly once', async () => {
    // Arrange
    const user = await insertUser();
    const b = await browser(t.app);
    mailProxy().down();

    // Act: ask for a reset while nothing can be sent.
    const res = await b.post('/api/auth/password-reset', { email: user.email });
    await new Promise((r) => setTimeout(r, 2_500));
    const whileDown = mailsTo(user.email).length;
    mailProxy().up();
    const mail = await waitForMail(user.email, (m) => m.subject.includes('password'), 30_000);
    await new Promise((r) => setTimeout(r, 2_000));

    // Assert
    expect(res.status).toBe(202);
    expect(whileDown).toBe(0);
    expect(mail.text).toContain('/reset-password?token=');
    expect(mailsTo(user.email)).toHaveLength(1);
  });
});
