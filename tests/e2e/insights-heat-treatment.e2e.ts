import { expect, test, type Page } from '@playwright/test';
import { DEMO_PASSWORD } from '../../seeders/demo-people.ts';

// Jonah is a demo student with A356.0 heats and marked castings in the demo
// log; Morgan is the demo admin. The browser tests' database is their own.
const STUDENT = 'jonah@harbourlane.test';
const ADMIN = 'morgan@harbourlane.test';

async function signIn(page: Page, email: string) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: /sign in/i }).click();
  await expect(page).toHaveURL(/\/w\/[0-9a-f-]{36}\/heats/);
  return /\/w\/([0-9a-f-]{36})\//.exec(page.url())![1];
}

test.describe('insights and heat treatment', () => {
  test('when the admin opens insights for A356.0, then the charts draw and their tables hold the figures', async ({ page }, info) => {
    const workshopId = await signIn(page, ADMIN);

    await page.goto(`/w/${workshopId}/insights?alloy=A356.0`);

    await expect(page.getByRole('heading', { name: 'Insights', level: 1 })).toBeVisible();
    await expect(page.getByRole('table', { name: /Casting yield by month/ })).toBeAttached();
    await expect(page.locator('.recharts-surface').first()).toBeVisible();
    await page.screenshot({ path: info.outputPath('insights-desktop.png'), fullPage: true });
  });

  test('when a student plans A356.0 T6 and opens the oven sheet, then it prints the steps in both units with blanks', async ({ page }, info) => {
    const workshopId = await signIn(page, STUDENT);
    await page.goto(`/w/${workshopId}/heat-treatment`);
    const form = page.getByRole('form', { name: 'Plan a heat treatment' });
    await form.getByRole('checkbox').first().check();
    await form.getByLabel('Oven or kiln').fill('Pottery kiln in the back room');
    await form.getByRole('button', { name: 'Save the plan' }).click();
    await expect(page).toHaveURL(/\/heat-treatment\/[0-9a-f-]{36}$/);
    const planId = page.url().split('/').pop()!;
    await page.screenshot({ path: info.outputPath('heat-treatment-record.png'), fullPage: true });

    await page.getByRole('link', { name: 'Oven sheet' }).click();
    await expect(page.getByRole('heading', { name: /Heat-treatment sheet: A356.0 T6/ })).toBeVisible();
    await page.emulateMedia({ media: 'print' });
    await expect(page.getByText('540 °C (1004 °F)')).toBeVisible();
    await expect(page.getByRole('button', { name: 'Print the sheet' })).toBeHidden();
    await expect(page.getByRole('navigation', { name: 'Main' }).first()).toBeHidden();
    await page.screenshot({ path: info.outputPath('heat-treatment-sheet-print.png'), fullPage: true });
    await page.pdf({ path: info.outputPath('heat-treatment-sheet.pdf'), format: 'A4' });

    // Leave the demo log as it was.
    const status = await page.evaluate(async (url) => {
      const me = (await (await fetch('/api/auth/me')).json()) as { csrfToken: string };
      return (await fetch(url, { method: 'DELETE', headers: { 'x-csrf-token': me.csrfToken } })).status;
    }, `/api/workshops/${workshopId}/heat-treatments/${planId}`);
    expect(status).toBe(204);
  });
});
