import { expect, test, type Page } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_PEOPLE } from '../../seeders/demo-people.ts';

// The heat log at the furnace: a caster on a phone lists a furnace and a
// crucible, logs a heat with one casting, reads its figures, and sees the
// crucible's life move on by one heat. The demo seed has people only, so the
// test makes its own equipment (with names no other run shares).

const caster = DEMO_PEOPLE.find((p) => p.email === 'ray@harbourlane.test')!;

async function signIn(page: Page) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(caster.email);
  await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: /sign in/i }).click();
  await expect(page).toHaveURL(/\/w\/[0-9a-f-]{36}\/heats$/);
  return /\/w\/([0-9a-f-]{36})\//.exec(page.url())![1]!;
}

test.describe('the heat log on a phone', () => {
  test('when a caster logs a heat with one casting, then its page shows yield and superheat and the crucible counts one more heat', async ({ browser }, info) => {
    const context = await browser.newContext({ viewport: { width: 375, height: 740 }, hasTouch: true, isMobile: true });
    const page = await context.newPage();
    const tag = Date.now().toString(36);
    const furnaceName = `Test forge ${tag}`;
    const crucibleName = `A6 pot ${tag}`;

    // Arrange: sign in, then list a furnace and a crucible through the equipment page.
    const workshopId = await signIn(page);
    await page.goto(`/w/${workshopId}/equipment`);
    await page.getByRole('button', { name: 'Add a furnace' }).click();
    const furnaceForm = page.getByRole('form', { name: 'Add a furnace' });
    await furnaceForm.getByLabel('Name').fill(furnaceName);
    await furnaceForm.getByLabel('Kind').selectOption('gas');
    await furnaceForm.getByRole('button', { name: 'Add the furnace' }).click();
    await expect(page.getByRole('link', { name: furnaceName })).toBeVisible();

    await page.getByRole('button', { name: 'Add a crucible' }).click();
    const crucibleForm = page.getByRole('form', { name: 'Add a crucible' });
    await crucibleForm.getByLabel('Name').fill(crucibleName);
    await crucibleForm.getByLabel('Capacity').fill('3000');
    await crucibleForm.getByRole('button', { name: 'Add the crucible' }).click();
    const crucibleLink = page.getByRole('link', { name: crucibleName });
    await expect(crucibleLink).toBeVisible();
    await crucibleLink.click();
    await expect(page.getByRole('heading', { level: 1, name: crucibleName })).toBeVisible();
    const crucibleUrl = page.url();
    await expect(page.getByText('0 of 20 heats', { exact: true })).toBeVisible();

    // Act: log the heat at the "furnace", as a caster would on the phone.
    await page.goto(`/w/${workshopId}/heats`);
    await page.getByRole('link', { name: 'Log a heat' }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Log a heat' })).toBeVisible();
    await page.getByLabel('Alloy', { exact: true }).selectOption('A356.0');
    await page.getByLabel('Furnace', { exact: true }).selectOption({ label: `${furnaceName} (gas)` });
    await page.getByLabel('Crucible', { exact: true }).selectOption({ label: `${crucibleName} (clay-graphite)` });
    await page.getByRole('button', { name: 'Melt started' }).click();
    await expect(page.getByRole('group', { name: 'Hold time' })).toContainText('In the furnace for');
    await page.getByLabel('Mass', { exact: true }).fill('1000');
    await page.getByLabel('Pour temperature', { exact: true }).fill('720');
    await expect(page.getByLabel('Pour figures')).toContainText('105 °C');
    await page.getByRole('button', { name: 'Add a casting' }).click();
    await page.getByLabel('Mass as weighed').fill('420');
    await expect(page.getByLabel('Charge figures')).toContainText('42 %');
    await page.getByRole('button', { name: 'Poured' }).click();
    for (const check of ['Tools dry', 'Protective equipment on', 'Floor clear']) await page.getByLabel(check).check();
    await page.screenshot({ path: info.outputPath('heat-form-phone.png'), fullPage: true });
    await page.getByRole('button', { name: 'Save the heat' }).click();

    // Assert: the heat's page carries the figures, worked out by the server.
    await expect(page).toHaveURL(new RegExp(`/w/${workshopId}/heats/[0-9a-f-]{36}$`));
    await expect(page.getByRole('heading', { level: 1, name: 'A356.0 heat' })).toBeVisible();
    const figures = page.getByLabel('Figures of this heat');
    await expect(figures.getByText('Superheat', { exact: true })).toBeVisible();
    await expect(figures).toContainText('105 °C');
    await expect(figures).toContainText('42 %');
    await expect(figures).toContainText('remainder 580 g');
    await expect(page.getByRole('link', { name: /Casting 1/ })).toBeVisible();
    await page.screenshot({ path: info.outputPath('heat-detail-phone.png'), fullPage: true });

    await page.goto(crucibleUrl);
    await expect(page.getByText('1 of 20 heats', { exact: true })).toBeVisible();
    await expect(page.getByRole('link', { name: /A356\.0/ })).toBeVisible();
    await page.screenshot({ path: info.outputPath('crucible-phone.png'), fullPage: true });
    await context.close();
  });
});

test.describe('the heat log at a desk', () => {
  test('when a caster edits a heat from the filtered log, then only the change is saved and the figures follow it', async ({ page }, info) => {
    // Arrange: a heat of this caster's, written through the API as an import or another device would.
    const workshopId = await signIn(page);
    const { csrfToken } = (await (await page.request.get('/api/auth/me')).json()) as { csrfToken: string };
    const notes = `desk edit ${Date.now().toString(36)}`;
    const created = await page.request.post(`/api/workshops/${workshopId}/heats`, {
      headers: { 'x-csrf-token': csrfToken },
      data: {
        alloy: 'A356.0',
        pouredAt: new Date().toISOString(),
        chargeLines: [{ kind: 'ingot', massG: 1000 }],
        pourTempC: 700,
        castings: [{ massG: 400 }],
        notes,
        safety: { dryTools: true, ppe: true, clearFloor: true },
      },
    });
    expect(created.status()).toBe(201);
    const heat = (await created.json()) as { id: string };

    // Act: find it in the log filtered by alloy, open it, change the pour temperature.
    await page.goto(`/w/${workshopId}/heats?alloy=A356.0`);
    const table = page.getByRole('table', { name: /^Heats, sorted by poured/ });
    await expect(table).toBeVisible();
    await expect(page.getByRole('region', { name: 'Filters' }).getByLabel('Alloy', { exact: true })).toHaveValue('A356.0');
    await page.screenshot({ path: info.outputPath('heat-log-desk.png'), fullPage: true });
    await page.goto(`/w/${workshopId}/heats/${heat.id}`);
    await page.getByRole('link', { name: 'Edit' }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Edit the A356.0 heat' })).toBeVisible();
    await page.getByLabel('Pour temperature', { exact: true }).fill('730');
    await page.getByRole('button', { name: 'Save the changes' }).click();

    // Assert
    await expect(page).toHaveURL(new RegExp(`/heats/${heat.id}$`));
    const figures = page.getByLabel('Figures of this heat');
    await expect(figures).toContainText('115 °C');
    await expect(figures).toContainText('40 %');
    await expect(page.getByText(notes)).toBeVisible();
  });
});
