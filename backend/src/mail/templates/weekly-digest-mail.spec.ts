import { describe, expect, it } from '@jest/globals';
import { weeklyDigestMail } from './weekly-digest-mail';

const input = {
  displayName: 'Maren Quill',
  weekOf: new Date('2031-03-03T00:00:00Z'),
  attempts: 7,
  passRate: 5 / 7,
  meanDeltaE: 3.44,
  bestSkill: 'value' as const,
  weakestSkill: 'chroma' as const,
  progressUrl: 'https://mixmark.test/progress',
};

describe('weeklyDigestMail', () => {
  it('should name the week and give the figures in text and HTML', () => {
    const mail = weeklyDigestMail(input);
    expect(mail.subject).toBe('Your week at Mixmark: the week of 3 March 2031');
    expect(mail.text).toContain(
      'Attempts: 7\nPassed: 71 %\nMean ΔE00 from target: 3.4, a visible difference side by side\n' +
        'Strongest: value (how light or dark)\nMost room to grow: chroma (how intense or greyed)',
    );
    expect(mail.html).toContain('>71 %</td>');
    expect(mail.html).toContain('>value (how light or dark)</td>');
  });

  it("should give a painter's tip for the weakest skill and link to the progress page", () => {
    const mail = weeklyDigestMail(input);
    expect(mail.text).toContain('add a little of its complement rather than black');
    expect(mail.text).toContain(`\n${input.progressUrl}\n`);
    expect(mail.html).toContain(`href="${input.progressUrl}"`);
  });

  it('should say so gently when there were no attempts, without figures', () => {
    const mail = weeklyDigestMail({
      ...input,
      attempts: 0,
      passRate: 0,
      meanDeltaE: null,
      bestSkill: null,
      weakestSkill: null,
    });
    expect(mail.text).toContain('You did not send any attempts in the week of 3 March 2031.');
    expect(mail.text).not.toContain('Attempts:');
    expect(mail.html).not.toContain('ΔE00');
  });

  it('should escape markup in the display name', () => {
    const mail = weeklyDigestMail({ ...input, displayName: '<script>x()</script>' });
    expect(mail.html).not.toContain('<script>');
    expect(mail.html).toContain('Hello &lt;script&gt;x()&lt;/script&gt;,');
  });

  it('should refuse a pass rate given as a percentage', () => {
    expect(() => weeklyDigestMail({ ...input, passRate: 71 })).toThrow(
      'passRate must be a share from 0 to 1, but is 71',
    );
  });

  it('should give the errors by skill, the streak, what is still due and the way to turn it off', () => {
    const mail = weeklyDigestMail({
      ...input,
      errors: { value: 2.04, temperature: 0.0349, chroma: 4.46 },
      streakDays: 1,
      due: [{ title: 'Value ladder in indigo', className: 'Tuesday wash', dueAt: new Date('2031-03-11T17:00:00Z'), standing: 'not started' }],
      accountUrl: 'https://mixmark.test/account',
    });
    expect(mail.text).toContain('Value error (|ΔL*|): 2.0\nTemperature error (warm–cool index): 0.03\nChroma error (|ΔC′|): 4.5\n');
    expect(mail.text).toContain('Practice streak: 1 day\n');
    expect(mail.text).toContain('Still to do:\n- Value ladder in indigo (Tuesday wash): due 11 March 2031, not started');
    expect(mail.text).toContain('turn them off on your account page:\nhttps://mixmark.test/account\n');
    expect(mail.html).toContain('<a href="https://mixmark.test/account">https://mixmark.test/account</a>');
  });

  it('should leave out the pass rate when nothing of the week was graded', () => {
    const mail = weeklyDigestMail({ ...input, attempts: 2, passRate: null, meanDeltaE: null });
    expect(mail.text).toContain('Attempts: 2\n');
    expect(mail.text).not.toContain('Passed:');
  });

  it('should refuse an account link that is not a web address', () => {
    expect(() => weeklyDigestMail({ ...input, accountUrl: 'javascript:alert(1)' })).toThrow(
      'accountUrl must be an absolute http(s) address, but is "javascript:alert(1)"',
    );
  });
});
