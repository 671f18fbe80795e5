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
});
