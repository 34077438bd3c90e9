import { describe, expect, it } from 'vitest';
import { simpleParser } from 'mailparser';
import nodemailer from 'nodemailer';
import { resetPasswordMessage, siteLink, verifyEmailMessage } from '../../../src/lib/mail/account-messages';
import { htmlEscape } from '../../../src/lib/mail/message';

describe('verifyEmailMessage', () => {
  it('has a plain-text and an HTML part that both carry the link', () => {
    const link = siteLink('http://127.0.0.1:4321', '/verify-email', 'tok_EN-123');
    const m = verifyEmailMessage({ to: 'a@b.org', displayName: 'Ann', link, validHours: 48 });
    expect(link).toBe('http://127.0.0.1:4321/verify-email?token=tok_EN-123');
    expect(m.text).toContain(link);
    expect(m.html).toContain(`href="${link}"`);
    expect(m.text).toContain('48 hours');
  });

  it('escapes names in the HTML part', () => {
    const m = verifyEmailMessage({
      to: 'a@b.org',
      displayName: '<img src=x>',
      link: 'http://x/?a=1&b=2',
      validHours: 1,
    });
    expect(m.html).not.toContain('<img');
    expect(m.html).toContain('&lt;img src=x&gt;');
    expect(m.html).toContain('http://x/?a=1&amp;b=2');
  });
});

describe('resetPasswordMessage', () => {
  it('reads back as a multipart/alternative mail with both parts (mailparser as the reference reader)', async () => {
    const m = resetPasswordMessage({ to: 'a@b.org', displayName: 'Ann', link: 'http://x/reset-password?token=t' });
    const transport = nodemailer.createTransport({ streamTransport: true, buffer: true });
    const info = await transport.sendMail({ from: 'k@x.org', ...m });
    const raw = (info as unknown as { message: Buffer }).message.toString();
    expect(raw).toMatch(/multipart\/alternative/);
    const parsed = await simpleParser(raw);
    expect(parsed.text).toContain('http://x/reset-password?token=t');
    expect(parsed.html).toContain('Choose a new password');
  });
});

describe('htmlEscape', () => {
  it('escapes the five HTML special characters', () => {
    expect(htmlEscape(`<a href="x">'&'</a>`)).toBe('&lt;a href=&quot;x&quot;&gt;&#39;&amp;&#39;&lt;/a&gt;');
  });
});
