import { expect, test } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_PEOPLE, DEMO_WORKSHOP } from '../../seeders/demo-people.ts';

// The demo workshop is loaded into the browser tests' own database by `npm test`.
const admin = DEMO_PEOPLE.find((p) => p.role === 'admin')!;
const student = DEMO_PEOPLE.find((p) => p.role === 'student')!;

test.describe('the shell', () => {
  test('when a demo admin signs in on a desktop, then the shell shows the workshop and its navigation', async ({ page }, info) => {
    // Arrange: a protected page sends a signed-out visitor to sign-in and back.
    await page.goto('/settings');
    await expect(page).toHaveURL(/\/sign-in\?next=%2Fsettings/);

    // Act
    await page.getByLabel('E-mail').fill(admin.email);
    await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: /sign in/i }).click();

    // Assert
    await expect(page).toHaveURL(/\/settings$/);
    await page.goto('/');
    await expect(page).toHaveURL(/\/w\/[0-9a-f-]{36}\/heats$/);
    const nav = page.getByRole('navigation', { name: 'Main' }).first();
    for (const place of ['Heats', 'Gallery', 'Reports', 'Guide']) {
      await expect(nav.getByRole('link', { name: place })).toBeVisible();
    }
    await expect(page.getByRole('combobox', { name: 'Workshop' })).toHaveValue(/[0-9a-f-]{36}/);
    await expect(page.getByRole('combobox', { name: 'Workshop' }).locator('option:checked')).toHaveText(new RegExp(DEMO_WORKSHOP.name));
    await page.screenshot({ path: info.outputPath('shell-desktop.png'), fullPage: true });
  });

  test('when a demo student signs in on a phone, then the bottom bar holds the four places and no members page', async ({ browser }, info) => {
    const context = await browser.newContext({ viewport: { width: 375, height: 740 }, hasTouch: true, isMobile: true });
    const page = await context.newPage();

    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill(student.email);
    await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: /sign in/i }).click();
    await expect(page).toHaveURL(/\/w\/[0-9a-f-]{36}\/heats$/);

    const bottomBar = page.getByRole('navigation', { name: 'Main' }).last();
    await expect(bottomBar).toBeVisible();
    for (const place of ['Heats', 'Gallery', 'Reports', 'Guide']) {
      await expect(bottomBar.getByRole('link', { name: place })).toBeVisible();
    }
    await bottomBar.getByRole('button', { name: /more/i }).click();
    await expect(page.getByRole('link', { name: 'Safety', exact: true })).toBeVisible();
    await expect(page.getByRole('link', { name: 'Members', exact: true })).toHaveCount(0);
    await page.screenshot({ path: info.outputPath('shell-phone.png'), fullPage: true });
    await context.close();
  });

  test('when the password is wrong, then the page says so without saying whether the account exists', async ({ page }) => {
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill(admin.email);
    await page.getByLabel('Password', { exact: true }).fill('not the demo password');
    await page.getByRole('button', { name: /sign in/i }).click();
    await expect(page.getByText(/do not match/i)).toBeVisible();
  });
});
