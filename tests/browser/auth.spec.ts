/**
 * The account flows a person goes through, in Debian's chromium against the test server: sign up, open the
 * verification link from the mail the SMTP fake caught, sign in, sign out; reset a password through the mail;
 * create a class and join it by its code as a student device. Unique e-mails keep reruns independent.
 */
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { emailUnique, linkIn, mailWait } from '../api/auth-helpers';
import { browserLaunch, pageNew } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await browserLaunch();
});
afterAll(async () => {
  await browser?.close();
});

async function hydrated(page: Page): Promise<void> {
  await page.waitForFunction(() => !document.querySelector('astro-island[ssr]'));
}

async function signIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto('/sign-in');
  await hydrated(page);
  await page.getByLabel('E-mail address').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

const PASSWORD = 'paper rockets fold at dawn';

describe('teacher account in the browser', () => {
  const email = emailUnique('browser');

  it('signs up, verifies the address from the mail, signs in and signs out', async () => {
    const { page, errors } = await pageNew(browser);
    await page.goto('/sign-up');
    await hydrated(page);
    await page.getByLabel('Your name').fill('Robin Browser');
    await page.getByLabel('School e-mail address').fill(email);
    // A too-short password first: the error shows beside the field and the typed values stay.
    await page.getByLabel('Password').fill('too short');
    await page.getByLabel('School', { exact: true }).selectOption({ label: 'Larkspur Elementary (Larkspur)' });
    await page.getByRole('button', { name: 'Create my account' }).click();
    const passwordError = page.locator('#password-error');
    await passwordError.waitFor();
    expect(await passwordError.textContent()).toMatch(/at least 15 characters/);
    expect(await page.getByLabel('Password').getAttribute('aria-describedby')).toContain('password-error');
    expect(await page.getByLabel('Password').getAttribute('aria-invalid')).toBe('true');
    expect(await page.getByLabel('Your name').inputValue()).toBe('Robin Browser');
    expect(await page.getByLabel('School e-mail address').inputValue()).toBe(email);

    await page.getByLabel('Password').fill(PASSWORD);
    await page.getByRole('button', { name: 'Create my account' }).click();
    await page.getByRole('status').filter({ hasText: 'We sent a link' }).waitFor();

    const mail = await mailWait(email, /Confirm your e-mail/);
    const link = linkIn(mail, '/verify-email');
    await page.goto(link.pathname + link.search);
    await hydrated(page);
    await page.getByRole('button', { name: 'Confirm my e-mail address' }).click();
    await page.getByText('Your e-mail address is confirmed').waitFor();

    await signIn(page, email, PASSWORD);
    await page.waitForURL('**/classes');
    expect(await page.getByRole('heading', { name: 'My classes' }).isVisible()).toBe(true);
    await page.getByRole('button', { name: 'Sign out', exact: true }).click();
    await page.waitForURL((url) => url.pathname === '/');
    expect(await page.getByRole('link', { name: 'Sign in' }).first().isVisible()).toBe(true);
    expect(errors).toEqual([]);
  });

  it('resets the password through the mailed link', async () => {
    const { page } = await pageNew(browser);
    await page.goto('/forgot-password');
    await hydrated(page);
    await page.getByLabel('E-mail address of your account').fill(email);
    await page.getByLabel('E-mail address of your account').press('Enter');
    await page.getByRole('status').filter({ hasText: 'a link to choose a new password' }).waitFor();

    const mail = await mailWait(email, /new Kitwright password/);
    const link = linkIn(mail, '/reset-password');
    await page.goto(link.pathname + link.search);
    await hydrated(page);
    const newPassword = 'a second password for robin';
    await page.getByLabel('New password', { exact: true }).fill(newPassword);
    await page.getByRole('button', { name: 'Set my new password' }).click();
    await page.getByText('every other session has been signed out').waitFor();
    // The reset signed this browser in.
    await page.getByRole('link', { name: 'Go to my account' }).click();
    await page.waitForURL('**/account');
    expect(await page.getByTestId('account-email').textContent()).toBe(email);
    await page.getByRole('button', { name: 'Sign out', exact: true }).click();
    await page.waitForURL((url) => url.pathname === '/');

    await signIn(page, email, PASSWORD);
    await page.getByRole('alert').filter({ hasText: 'do not match' }).waitFor();
    await page.getByLabel('Password', { exact: true }).fill(newPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL('**/classes');
  });

  it('creates a class, and a student device joins it by its code without an account', async () => {
    const teacher = await pageNew(browser);
    await signIn(teacher.page, email, 'a second password for robin');
    await teacher.page.waitForURL('**/classes');
    await hydrated(teacher.page);
    await teacher.page.getByLabel('Class name').fill('Browser Rocketry');
    await teacher.page.getByLabel('Grade band').selectOption('3-5');
    await teacher.page.getByLabel('Number of students').fill('24');
    await teacher.page.getByRole('button', { name: 'Add the class' }).click();
    await teacher.page.waitForURL(/\/classes\/[0-9a-f-]{36}$/);
    const code = (await teacher.page.getByTestId('class-code').textContent())!.trim();
    expect(code).toMatch(/^[2-9A-HJKMNP-Z]{4}-[2-9A-HJKMNP-Z]{4}$/);

    const student = await pageNew(browser);
    await student.page.goto('/join');
    await hydrated(student.page);
    await student.page.getByLabel('Class code').fill(code.toLowerCase());
    await student.page.keyboard.press('Enter');
    await student.page.waitForURL('**/class');
    expect((await student.page.getByTestId('class-name').textContent())?.trim()).toBe('Browser Rocketry');
    expect(await student.page.getByText('Class session').isVisible()).toBe(true);
    // The class session cannot open the teacher's pages.
    const res = await student.page.goto('/classes');
    expect(res?.status()).toBe(403);
    await student.page.goto('/class');
    await student.page.getByRole('button', { name: 'Leave class' }).click();
    await student.page.waitForURL('**/join?left=1');
    expect(student.errors).toEqual([]);
  });
});
