import { describe, expect, it } from '@jest/globals';
import { invitationMail } from './invitation-mail';

const input = {
  teacherName: 'Wren Halloway',
  className: 'Thursday watercolour',
  acceptUrl: 'https://mixmark.test/invitations/accept?token=abc&class=7',
  expiresAt: new Date('2031-03-04T17:30:00Z'),
};

describe('invitationMail', () => {
  it('should name the teacher and the class in the subject, text and HTML', () => {
    const mail = invitationMail(input);
    expect(mail.subject).toBe(
      'Wren Halloway invited you to the class Thursday watercolour on Mixmark',
    );
    expect(mail.text).toContain(
      'Wren Halloway has invited you to join the class "Thursday watercolour"',
    );
    expect(mail.html).toContain('<strong>Wren Halloway</strong>');
    expect(mail.html).toContain('<strong>Thursday watercolour</strong>');
  });

  it('should carry the link in both bodies, with & escaped in the HTML', () => {
    const mail = invitationMail(input);
    expect(mail.text).toContain(`\n${input.acceptUrl}\n`);
    expect(mail.html).toContain(
      'href="https://mixmark.test/invitations/accept?token=abc&amp;class=7"',
    );
    expect(mail.html).toContain('>Join the class</a>');
  });

  it('should say when the link stops working, naming the time zone', () => {
    const mail = invitationMail(input);
    expect(mail.text).toContain('The link works until 4 March 2031 at 17:30 UTC.');
    expect(mail.html).toContain('4 March 2031 at 17:30 UTC');
  });

  it('should escape markup in the names and keep the subject on one line', () => {
    const mail = invitationMail({
      ...input,
      teacherName: '<script>alert("x")</script>',
      className: 'Greys &\nneutrals',
    });
    expect(mail.html).not.toContain('<script>');
    expect(mail.html).toContain('&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt;');
    expect(mail.html).toContain('Greys &amp;\nneutrals');
    expect(mail.subject).toBe(
      '<script>alert("x")</script> invited you to the class Greys & neutrals on Mixmark',
    );
    expect(mail.text).toContain('<script>alert("x")</script> has invited you');
  });

  it('should refuse a link that is not an http(s) address', () => {
    expect(() => invitationMail({ ...input, acceptUrl: 'javascript:alert(1)' })).toThrow(
      'acceptUrl must be an absolute http(s) address, but is "javascript:alert(1)"',
    );
    expect(() => invitationMail({ ...input, acceptUrl: '/invitations/abc' })).toThrow(
      /acceptUrl must be an absolute/,
    );
  });

  it('should refuse an invalid expiry date', () => {
    expect(() => invitationMail({ ...input, expiresAt: new Date('soon') })).toThrow(
      /must be a valid Date/,
    );
  });
});
