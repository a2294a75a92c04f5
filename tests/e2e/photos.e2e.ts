import { expect, test, type APIRequestContext, type Page } from '@playwright/test';
import { heatDetailSchema } from '../../shared/heats/heat-schemas.ts';
import { DEMO_PASSWORD } from '../../seeders/demo-people.ts';
import { ingotPhoto } from '../support/images.ts';

// The demo workshop is loaded into the browser tests' own database by `npm test`.
const CASTER_EMAIL = 'ray@harbourlane.test';

async function signIn(page: Page, email: string) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: /sign in/i }).click();
  await expect(page).toHaveURL(/\/w\/[0-9a-f-]{36}\/heats$/);
}

/** A heat with one 640 g casting, logged through the API as the signed-in member. */
async function logHeatWithOneCasting(request: APIRequestContext) {
  const me = (await (await request.get('/api/auth/me')).json()) as { csrfToken: string; user: { memberships: { workshopId: string }[] } };
  const workshopId = me.user.memberships[0].workshopId;
  const response = await request.post(`/api/workshops/${workshopId}/heats`, {
    headers: { 'x-csrf-token': me.csrfToken },
    data: {
      pouredAt: new Date().toISOString(),
      alloy: 'A356.0',
      chargeLines: [{ kind: 'ingot', description: 'A356 ingot', massG: 1200 }],
      pourTempC: 720,
      castings: [{ massG: 640 }],
    },
  });
  expect(response.status(), await response.text()).toBe(201);
  const heat = heatDetailSchema.parse(await response.json());
  return { workshopId, heatId: heat.id, castingId: heat.castings[0].id, csrfToken: me.csrfToken };
}

test.describe('photos', () => {
  test('when the demo caster adds a photo to a casting and marks gas porosity, then a misspelt gallery search finds it', async ({ page }, info) => {
    // Arrange: signed in as the caster, with a fresh heat and casting.
    await signIn(page, CASTER_EMAIL);
    const { workshopId, heatId, castingId } = await logHeatWithOneCasting(page.request);
    const title = `Ingot for the search test ${Date.now()}`;

    // Act 1: open the casting and drop a photo on it.
    await page.goto(`/w/${workshopId}/heats/${heatId}/castings/${castingId}`);
    await expect(page.getByRole('heading', { level: 1, name: 'Casting 1 of 1' })).toBeVisible();
    await expect(page.getByText('640 g')).toBeVisible();
    await expect(page.getByText('Location data is removed from every photo.')).toBeVisible();
    const jpeg = await ingotPhoto({ width: 960, height: 720, seed: Date.now() % 997 });
    await page.getByLabel('Photos to add').setInputFiles({ name: 'ingot-top.jpg', mimeType: 'image/jpeg', buffer: jpeg });

    // Assert 1: its bar reaches the end and the photo joins the casting's grid.
    const row = page.locator('[data-upload-status]').filter({ hasText: 'ingot-top.jpg' });
    await expect(row).toHaveAttribute('data-upload-status', 'stored', { timeout: 20_000 });
    await expect(row.getByRole('progressbar')).toHaveCount(1);
    await expect(row.getByRole('progressbar')).toHaveAttribute('aria-valuenow', '100');
    const grid = page.getByRole('list', { name: 'Photos of this casting' });
    await expect(grid.getByRole('link')).toHaveCount(1);
    await page.screenshot({ path: info.outputPath('casting-after-upload.png'), fullPage: true });

    // Act 2: open the photo and mark gas porosity with the keyboard.
    await grid.getByRole('link').first().click();
    await expect(page).toHaveURL(/\/photos\/[0-9a-f-]{36}$/);
    await expect(page.getByRole('img', { name: /A356\.0 casting/ })).toBeVisible();
    await page.keyboard.press('m');
    await expect(page.getByRole('application', { name: /Tap the defect/ })).toBeFocused();
    for (let i = 0; i < 5; i++) await page.keyboard.press('ArrowLeft');
    await page.keyboard.press('Enter');
    const picker = page.getByRole('dialog', { name: 'Mark a defect' });
    await expect(picker.getByLabel('Find the defect')).toBeFocused();
    await page.keyboard.type('bubbles');
    await page.keyboard.press('Enter');
    await expect(picker.getByRole('radio', { name: /Gas porosity \(hydrogen\)|Blowholes/ }).first()).toBeVisible();
    await picker.getByLabel('Find the defect').fill('gas porosity');
    await picker.getByLabel('Find the defect').press('Enter');
    await expect(picker.getByRole('radio', { name: /Gas porosity \(hydrogen\)/ })).toBeChecked();
    await picker.getByText('3 Serious').click();
    await page.screenshot({ path: info.outputPath('defect-picker.png') });
    await picker.getByRole('button', { name: 'Save mark' }).click();
    await expect(picker).toHaveCount(0);
    const marks = page.getByRole('list', { name: 'Marks on this photo' });
    await expect(marks.getByRole('listitem')).toHaveCount(1);
    await expect(marks).toContainText('Gas porosity');

    // Act 3: and a hot tear as a box, dragged with the pointer (still in marking mode).
    const surface = page.getByRole('application', { name: /Tap the defect/ });
    const box = (await surface.boundingBox())!;
    await page.mouse.move(box.x + box.width * 0.6, box.y + box.height * 0.3);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width * 0.7, box.y + box.height * 0.45, { steps: 5 });
    await page.mouse.move(box.x + box.width * 0.8, box.y + box.height * 0.6, { steps: 5 });
    await page.mouse.up();
    await picker.getByLabel('Find the defect').fill('hot tare');
    await picker.getByLabel('Find the defect').press('Enter');
    await picker.getByRole('button', { name: 'Save mark' }).click();
    await expect(marks.getByRole('listitem')).toHaveCount(2);
    await expect(marks).toContainText('Hot tear');
    await expect(page.locator('[data-mark-id]')).toHaveCount(2);
    await page.keyboard.press('Escape');
    await page.keyboard.press(']');
    await expect(marks.getByRole('button', { name: /Mark 1/ })).toHaveAttribute('aria-current', 'true');

    // Act 4: name the photo.
    await page.getByRole('button', { name: 'Edit title and notes' }).click();
    await page.getByLabel('Title').fill(title);
    await page.getByRole('button', { name: 'Save details' }).click();
    await expect(page.getByRole('heading', { level: 1, name: title })).toBeVisible();
    await page.evaluate(() => window.scrollTo(0, 0));
    await page.screenshot({ path: info.outputPath('photo-with-marks.png') });

    // Assert 2: the gallery finds it by a misspelt defect name, and the lightbox shows it.
    await page.goto(`/w/${workshopId}/gallery`);
    await expect(page.getByRole('list', { name: 'Photos' }).getByRole('link', { name: title })).toBeVisible();
    await page.getByLabel('Search the photos').fill('gass porosty');
    await expect(page).toHaveURL(/q=gass\+porosty/);
    const results = page.getByRole('list', { name: 'Search results' });
    await expect(results.getByRole('link', { name: title })).toBeVisible();
    await page.screenshot({ path: info.outputPath('gallery-search.png'), fullPage: true });
    await results.getByRole('button', { name: `Look at ${title} larger` }).click();
    const lightbox = page.getByRole('dialog', { name: new RegExp(title) });
    await expect(lightbox.getByRole('list', { name: 'Marks' })).toContainText('Gas porosity');
    await page.screenshot({ path: info.outputPath('gallery-lightbox.png') });
    await page.keyboard.press('Escape');
    await expect(lightbox).toHaveCount(0);

    // A shared link with the filter in it opens the same view.
    await page.goto(`/w/${workshopId}/gallery?kind=hot_tear`);
    await expect(page.getByLabel('Defect', { exact: true })).toHaveValue('hot_tear');
    await expect(page.getByRole('list', { name: 'Photos' }).getByRole('link', { name: title })).toBeVisible();
  });

  test('when the caster opens a marked photo on a phone, then the photo leads and the marks follow below', async ({ browser }, info) => {
    // The shop floor often prefers dark: the phone runs the dark theme.
    const context = await browser.newContext({ viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true, colorScheme: 'dark' });
    const page = await context.newPage();
    await signIn(page, CASTER_EMAIL);
    const { workshopId, castingId, csrfToken } = await logHeatWithOneCasting(page.request);
    const upload = await page.request.post(`/api/workshops/${workshopId}/castings/${castingId}/photos`, {
      headers: { 'x-csrf-token': csrfToken },
      multipart: {
        photos: { name: 'phone.jpg', mimeType: 'image/jpeg', buffer: await ingotPhoto({ width: 720, height: 960, seed: (Date.now() % 991) + 3 }) },
      },
    });
    expect(upload.status()).toBe(201);
    const photoId = ((await upload.json()) as { results: { photo: { id: string } }[] }).results[0].photo.id;
    const mark = await page.request.post(`/api/workshops/${workshopId}/photos/${photoId}/marks`, {
      headers: { 'x-csrf-token': csrfToken },
      data: { kind: 'shrinkage_sink', severity: 2, shape: 'box', x: 0.3, y: 0.35, width: 0.3, height: 0.2, note: 'dish over the thick end' },
    });
    expect(mark.status()).toBe(201);

    await page.goto(`/w/${workshopId}/photos/${photoId}`);
    const photoBox = page.getByRole('img', { name: /casting/ });
    const list = page.getByRole('list', { name: 'Marks on this photo' });
    await expect(list).toContainText('Shrink sink');
    const [imageBox, listBox] = [await photoBox.boundingBox(), await list.boundingBox()];
    expect(imageBox && listBox && listBox.y > imageBox.y + imageBox.height - 1).toBe(true);
    await page.screenshot({ path: info.outputPath('photo-phone.png'), fullPage: true });
    await context.close();
  });
});
