import { describe, expect, it } from '@jest/globals';
import { attemptMarkedMail } from './attempt-marked-mail';

const input = {
  displayName: 'Maren Quill',
  drillTitle: 'Value ladder in burnt umber',
  score: 81.6,
  pass: true,
  feedbackLines: ['Step 3 is a little too light: less water.', 'Steps 4 and 5 are well spaced.'],
  attemptUrl: 'https://mixmark.test/attempts/41',
};

describe('attemptMarkedMail', () => {
  it('should give the rounded score and the outcome in subject, text and HTML', () => {
    const mail = attemptMarkedMail(input);
    expect(mail.subject).toBe('Your attempt at Value ladder in burnt umber is marked: 82, passed');
    expect(mail.text).toContain(
      'Your attempt at "Value ladder in burnt umber" scored 82 out of 100: passed.',
    );
    expect(mail.html).toContain('<strong>82</strong> out of 100: passed.');
  });

  it('should list every feedback line and link to the attempt', () => {
    const mail = attemptMarkedMail(input);
    expect(mail.text).toContain(
      '- Step 3 is a little too light: less water.\n- Steps 4 and 5 are well spaced.',
    );
    expect(mail.html).toContain(
      '<li style="margin:0 0 6px 0;">Step 3 is a little too light: less water.</li>',
    );
    expect(mail.text).toContain(`\n${input.attemptUrl}\n`);
    expect(mail.html).toContain(`href="${input.attemptUrl}"`);
  });

  it('should say "not passed yet" and invite another try when it did not pass', () => {
    const mail = attemptMarkedMail({ ...input, score: 48, pass: false });
    expect(mail.subject).toBe(
      'Your attempt at Value ladder in burnt umber is marked: 48, not passed yet',
    );
    expect(mail.text).toContain('mix again and take a new photo');
  });

  it('should lead with the teacher and quote the comment when there is one', () => {
    const mail = attemptMarkedMail({
      ...input,
      commentBy: 'Wren Halloway',
      comment: 'Good control of the water.\nTry the last step with less white.',
    });
    expect(mail.subject).toBe(
      'Wren Halloway commented on your attempt at Value ladder in burnt umber',
    );
    expect(mail.text).toContain(
      'Wren Halloway wrote:\n> Good control of the water.\n> Try the last step with less white.',
    );
    expect(mail.html).toContain(
      'Good control of the water.<br>Try the last step with less white.</blockquote>',
    );
  });

  it('should escape markup in names, title, feedback and comment', () => {
    const evil = '<script>alert(1)</script>';
    const mail = attemptMarkedMail({
      ...input,
      displayName: evil,
      drillTitle: evil,
      feedbackLines: [evil],
      commentBy: evil,
      comment: evil,
    });
    expect(mail.html).not.toContain('<script>');
    expect(
      mail.html.match(/&lt;script&gt;alert\(1\)&lt;\/script&gt;/g)?.length,
    ).toBeGreaterThanOrEqual(6);
  });

  it('should leave out the feedback heading when there are no lines', () => {
    const mail = attemptMarkedMail({ ...input, feedbackLines: [] });
    expect(mail.text).not.toContain('What the measurement says');
    expect(mail.html).not.toContain('<ul');
  });

  it('should refuse a score that is not a number', () => {
    expect(() => attemptMarkedMail({ ...input, score: Number.NaN })).toThrow(
      'score must be a number from 0 to 100, but is NaN',
    );
  });
});
