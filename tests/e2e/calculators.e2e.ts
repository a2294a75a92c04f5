import { expect, test, type Page } from '@playwright/test';
import { findAlloy, formatTemperature, formatTemperatureDifference, fToC, superheatC } from '../../shared/domain/index.ts';
import { DEMO_PASSWORD } from '../../seeders/demo-people.ts';

// The demo workshop is loaded into the browser tests' own database by `npm test`.
// A student the other browser tests do not sign in as, so changing their
// units cannot touch another test; the units go back to °C afterwards.
const STUDENT_EMAIL = 'lena@harbourlane.test';

async function signIn(page: Page, email: string) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: /sign in/i }).click();
  await expect(page).toHaveURL(/\/w\/[0-9a-f-]{36}\/heats$/);
}

async function session(page: Page) {
  const me = (await (await page.request.get('/api/auth/me')).json()) as {
    csrfToken: string;
    user: { memberships: { workshopId: string }[] };
  };
  return { csrfToken: me.csrfToken, workshopId: me.user.memberships[0].workshopId };
}

async function setTemperatureUnit(page: Page, temperatureUnit: 'C' | 'F') {
  const { csrfToken } = await session(page);
  const response = await page.request.patch('/api/auth/me', { headers: { 'x-csrf-token': csrfToken }, data: { temperatureUnit } });
  expect(response.status(), await response.text()).toBe(200);
}

test.describe('calculators and the defect guide', () => {
  test('when a demo student works in °F and enters a pour of 1350 °F for A356.0, then the superheat shown is the trade core’s', async ({ page }, info) => {
    // Arrange: signed in, units set to °F.
    await signIn(page, STUDENT_EMAIL);
    const { workshopId } = await session(page);
    await setTemperatureUnit(page, 'F');
    try {
      // Act: from the calculators' index to the superheat calculator.
      await page.goto(`/w/${workshopId}/calculators`);
      await page.getByRole('link', { name: /^Superheat/ }).click();
      await expect(page.getByRole('heading', { level: 1, name: 'Superheat' })).toBeVisible();
      await expect(page.getByRole('combobox', { name: 'Alloy' })).toHaveValue('A356.0');
      await page.getByRole('textbox', { name: /Pour temperature/ }).fill('1350');

      // Assert: the figure is superheatC of 1350 °F over A356.0's liquidus, shown in °F with °C beside it.
      const a356 = findAlloy('A356.0')!;
      const expected = superheatC(fToC(1350), a356);
      await expect(page.getByRole('status', { name: 'Superheat' })).toHaveText(formatTemperatureDifference(expected, 'F'));
      await expect(page.getByText(formatTemperatureDifference(expected, 'C'), { exact: true })).toBeVisible();
      await expect(page.getByText(formatTemperature(a356.liquidusC, 'F')).first()).toBeVisible();
      await page.screenshot({ path: info.outputPath('superheat-fahrenheit.png'), fullPage: true });

      // And the alloy library, from the "more" places, reads in °F too.
      await page.goto(`/w/${workshopId}/alloys`);
      await expect(page.getByRole('heading', { level: 1, name: 'Alloy library' })).toBeVisible();
      const row = page.getByRole('row').filter({ has: page.getByRole('rowheader', { name: /^A356\.0/ }) });
      await expect(row.getByText(formatTemperature(a356.liquidusC, 'F'))).toBeVisible();
      await page.screenshot({ path: info.outputPath('alloy-library-fahrenheit.png'), fullPage: true });

      // And the hydrogen chart draws its curves on a °F axis.
      await page.goto(`/w/${workshopId}/calculators/hydrogen`);
      const chart = page.getByRole('img', { name: /Line chart/ });
      await expect(chart).toBeVisible();
      await expect(chart.locator('.recharts-line-curve').first()).toBeVisible();
      await expect(chart.getByText('Temperature (°F)')).toBeVisible();
      await page.screenshot({ path: info.outputPath('hydrogen-chart.png'), fullPage: true });
    } finally {
      await setTemperatureUnit(page, 'C');
    }
  });

  test('when a demo student searches the guide for "bubbles", then the best match opens gas porosity', async ({ page }, info) => {
    await signIn(page, STUDENT_EMAIL);
    const { workshopId } = await session(page);

    await page.goto(`/w/${workshopId}/guide`);
    await page.getByRole('searchbox', { name: 'Search the defect guide' }).fill('bubbles');
    await expect(page.getByRole('heading', { name: /defects match “bubbles”, best first/ })).toBeVisible();
    await page.getByRole('link', { name: /Gas porosity \(hydrogen\)/ }).first().click();

    await expect(page).toHaveURL(new RegExp(`/w/${workshopId}/guide/gas_porosity$`));
    await expect(page.getByRole('heading', { level: 1, name: 'Gas porosity (hydrogen)' })).toBeVisible();
    await expect(page.getByRole('heading', { name: 'Gas or shrinkage?' })).toBeVisible();
    await expect(page.getByRole('heading', { name: 'Likely causes, by melt variable' })).toBeVisible();
    await expect(page.getByRole('link', { name: /Gallery: every photo marked gas porosity/ })).toHaveAttribute(
      'href',
      `/w/${workshopId}/gallery?kind=gas_porosity`,
    );
    await page.screenshot({ path: info.outputPath('guide-gas-porosity.png'), fullPage: true });
  });
});
