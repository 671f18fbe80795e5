import { describe, expect, it } from '@jest/globals';
import { passwordResetMail } from './password-reset-mail';

const input = {
  displayName: 'Maren Quill',
  resetUrl: 'https://mixmark.test/reset-password?token=r3set',
  expiresAt: new Date('2031-03-04T09:05:00Z'),
};

describe('passwordResetMail', () => {
  it('should greet the reader and carry the link and its expiry in text and HTML', () => {
    const mail = passwordResetMail(input);
    expect(mail.subject).toBe('Choose a new password for Mixmark');
    expect(mail.text).toMatch(/^Hello Maren Quill,\n/);
    expect(mail.text).toContain(`\n${input.resetUrl}\n`);
    expect(mail.text).toContain('The link works once, until 4 March 2031 at 09:05 UTC.');
    expect(mail.html).toContain(`href="${input.resetUrl}"`);
    expect(mail.html).toContain('Hello Maren Quill,');
    expect(mail.html).toContain('4 March 2031 at 09:05 UTC');
  });

  it('should tell a reader who did not ask that nothing changes', () => {
    const mail = passwordResetMail(input);
    expect(mail.text).toContain('your password stays as it is');
    expect(mail.html).toContain('your password stays as it is');
  });

  it('should escape markup in the display name', () => {
    const mail = passwordResetMail({ ...input, displayName: '<script>steal()</script>' });
    expect(mail.html).not.toContain('<script>');
    expect(mail.html).toContain('Hello &lt;script&gt;steal()&lt;/script&gt;,');
  });

  it('should refuse a link that is not an http(s) address', () => {
    expect(() => passwordResetMail({ ...input, resetUrl: 'data:text/html,hi' })).toThrow(
      /resetUrl must be an absolute http\(s\) address/,
    );
  });
});
