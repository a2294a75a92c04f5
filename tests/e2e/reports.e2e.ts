import { expect, test, type Page } from '@playwright/test';
import { DEMO_PASSWORD } from '../../seeders/demo-people.ts';
import { ingotPhoto } from '../support/images.ts';

// The demo workshop is loaded into the browser tests' own database by `npm test`.
const STUDENT_EMAIL = 'jonah@harbourlane.test';
const MENTOR_EMAIL = 'priya@harbourlane.test';

async function signIn(page: Page, email: string): Promise<string> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: /sign in/i }).click();
  await expect(page).toHaveURL(/\/w\/[0-9a-f-]{36}\/heats$/);
  return /\/w\/([0-9a-f-]{36})\//.exec(page.url())![1];
}

test.describe('defect reports', () => {
  test('when a student quick-checks a photo on a phone and asks a mentor, then the mentor reviews it on the mark and the student sees the confirmed cause', async ({ browser }, info) => {
    test.setTimeout(120_000);
    const title = `Pinholes on the top face ${Date.now()}`;

    // Arrange: the student on a 375 px phone, the mentor at a desk.
    const phone = await browser.newContext({ viewport: { width: 375, height: 812 }, hasTouch: true, isMobile: true });
    const desk = await browser.newContext({ viewport: { width: 1440, height: 900 } });
    const student = await phone.newPage();
    const mentor = await desk.newPage();
    const workshopId = await signIn(student, STUDENT_EMAIL);

    // Act 1: the quick check, from the reports page.
    await student.goto(`/w/${workshopId}/reports`);
    await student.getByRole('link', { name: 'Quick check' }).click();
    await expect(student).toHaveURL(/\/quick-check$/);
    await student.getByLabel('Alloy').selectOption('A356.0');
    await student.getByRole('button', { name: 'Start the quick check' }).click();
    await expect(student).toHaveURL(/heat=.*casting=/);
    const jpeg = await ingotPhoto({ width: 960, height: 720, seed: (Date.now() % 983) + 7 });
    await student.getByLabel('Photos to add').setInputFiles({ name: 'pinholes.jpg', mimeType: 'image/jpeg', buffer: jpeg });
    await expect(student.getByText('Photo added.')).toBeVisible({ timeout: 20_000 });

    // Mark gas porosity with a tap.
    await student.getByRole('button', { name: 'Mark a defect' }).click();
    const surface = student.getByRole('application', { name: /Tap the defect/ });
    const box = (await surface.boundingBox())!;
    await student.mouse.click(box.x + box.width * 0.4, box.y + box.height * 0.4);
    const picker = student.getByRole('dialog', { name: 'Mark a defect' });
    await picker.getByLabel('Find the defect').fill('gas porosity');
    await picker.getByLabel('Find the defect').press('Enter');
    await expect(picker.getByRole('radio', { name: /Gas porosity \(hydrogen\)/ })).toBeChecked();
    await picker.getByRole('button', { name: 'Save mark' }).click();
    await expect(picker).toHaveCount(0);
    await student.getByRole('button', { name: 'Done marking' }).click();

    // Answer the few questions that matter for gas porosity.
    const questions = student.getByTestId('quick-check-questions');
    await expect(questions).toBeVisible();
    // The stub heat already says "not degassed"; the air is what is left to tell.
    await questions.getByRole('textbox', { name: 'Air temperature', exact: true }).fill('24');
    await questions.getByRole('button', { name: 'Save air temperature' }).click();
    await expect(questions.getByText('Recorded').first()).toBeVisible();
    await questions.getByRole('textbox', { name: 'Relative humidity', exact: true }).fill('85');
    await questions.getByRole('button', { name: 'Save relative humidity' }).click();
    await expect(questions.getByText('Recorded')).toHaveCount(2);

    // Assert 1: the likely causes, with the caster's own evidence.
    const degassing = student.getByTestId('cause-degassing');
    await expect(degassing).toContainText('confirmed');
    await expect(degassing).toContainText('not degassed');
    await expect(student.getByTestId('what-if')).toContainText('What-if — not saved');
    await degassing.scrollIntoViewIfNeeded();
    await student.screenshot({ path: info.outputPath('quick-check-phone.png'), fullPage: true });

    // Act 2: ask a mentor and submit.
    await student.getByRole('button', { name: 'Ask a mentor' }).click();
    await student.getByLabel('Title').fill(title);
    await student.getByLabel('Your question').fill('Pinholes all over the top. Was it the gas?');
    await student.getByRole('button', { name: 'Start the report' }).click();
    await expect(student).toHaveURL(/\/reports\/[0-9a-f-]{36}$/);
    const reportUrl = student.url();
    await student.getByRole('button', { name: 'Submit to a mentor' }).click();
    await expect(student.getByTestId('report-state').first()).toHaveText('submitted');

    // Act 3: the mentor opens the review queue, starts the review, comments on the mark and resolves.
    await signIn(mentor, MENTOR_EMAIL);
    await mentor.goto(`/w/${workshopId}/review`);
    await expect(mentor.getByRole('heading', { level: 1, name: 'Review queue' })).toBeVisible();
    await mentor.getByRole('link', { name: title }).click();
    await expect(mentor).toHaveURL(reportUrl);
    await mentor.getByRole('button', { name: 'Start the review' }).click();
    await expect(mentor.getByTestId('report-state').first()).toHaveText('in review');
    const comments = mentor.getByTestId('comments');
    await comments.getByRole('textbox', { name: 'Add a comment', exact: true }).fill('These round, shiny holes are **hydrogen**: see the cluster here.');
    await comments.getByLabel('About a mark').selectOption({ label: 'Mark 1 · gas porosity (hydrogen)' });
    await comments.getByRole('button', { name: 'Post the comment' }).click();
    await expect(comments.getByTestId('comment')).toHaveCount(1);
    await expect(comments.getByTestId('comment').locator('strong')).toHaveText('hydrogen');
    await mentor.getByRole('button', { name: 'Resolve with confirmed causes' }).click();
    await mentor.getByRole('checkbox', { name: 'Degassing' }).check();
    await mentor.getByLabel('Fixes to try').fill('Degas with a tablet plunged to the bottom, then skim and pour within 5 min');
    await mentor.getByLabel('What you concluded').fill('Hydrogen from a melt that was never degassed.');
    await mentor.getByRole('button', { name: 'Resolve the report' }).click();
    await expect(mentor.getByTestId('report-state').first()).toHaveText('resolved');
    await mentor.screenshot({ path: info.outputPath('report-resolved-desk.png'), fullPage: true });

    // Assert 2: the student sees the comment on the photo and the resolved report.
    await student.reload();
    await expect(student.getByTestId('report-state').first()).toHaveText('resolved');
    await expect(student.getByTestId('confirmed-causes')).toContainText('Degassing');
    const comment = student.getByTestId('comment');
    await comment.getByRole('button', { name: /On Mark 1 · gas porosity/ }).click();
    await expect(student.locator('[data-mark-id][data-highlighted="true"]')).toHaveCount(1);
    await expect(student.getByRole('status').filter({ hasText: 'Showing Mark 1' })).toBeVisible();
    await student.screenshot({ path: info.outputPath('report-student-phone.png'), fullPage: true });

    await phone.close();
    await desk.close();
  });
});
