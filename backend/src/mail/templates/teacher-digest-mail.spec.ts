import { describe, expect, it } from '@jest/globals';
import { teacherDigestMail } from './teacher-digest-mail';

const input = {
  displayName: 'Ysolde Marr',
  weekOf: new Date('2031-03-03T00:00:00Z'),
  classes: [
    {
      name: 'Tuesday wash',
      attempts: 9,
      waitingForReview: 1,
      gradebookUrl: 'https://mixmark.test/teacher/classes/c1/gradebook',
      assignments: [
        {
          title: 'Warm and cool greens',
          dueAt: new Date('2031-03-06T18:00:00Z'),
          handedIn: ['Ada Fenn', 'Rui Sato'],
          behind: [{ name: 'Lio Park', standing: 'late' }],
        },
        { title: 'Flat wash', dueAt: new Date('2031-03-12T18:00:00Z'), handedIn: [], behind: [] },
      ],
    },
  ],
  dashboardUrl: 'https://mixmark.test/teacher',
  accountUrl: 'https://mixmark.test/account',
};

describe('teacherDigestMail', () => {
  it('should say per class who handed in, who is behind and what waits for review', () => {
    const mail = teacherDigestMail(input);
    expect(mail.subject).toBe('Your classes at Mixmark: the week of 3 March 2031');
    expect(mail.text).toContain(
      'Tuesday wash\n- 9 attempts sent that week; 1 attempt marked below the pass line and waiting for your review.\n' +
        '- Warm and cool greens, due 6 March 2031: handed in by Ada Fenn, Rui Sato; behind: Lio Park (late).\n' +
        '- Flat wash, due 12 March 2031: nobody has handed it in yet; nobody is behind.\n' +
        'Gradebook: https://mixmark.test/teacher/classes/c1/gradebook',
    );
    expect(mail.html).toContain('href="https://mixmark.test/teacher/classes/c1/gradebook"');
  });

  it('should link to the account page to turn the digest off', () => {
    const mail = teacherDigestMail(input);
    expect(mail.text).toContain('turn them off on your account page:\nhttps://mixmark.test/account\n');
    expect(mail.html).toContain('<a href="https://mixmark.test/account">https://mixmark.test/account</a>');
  });

  it('should escape markup in class and student names', () => {
    const mail = teacherDigestMail({ ...input, classes: [{ ...input.classes[0], name: '<b>Wash</b>' }] });
    expect(mail.html).not.toContain('<b>Wash</b>');
    expect(mail.html).toContain('&lt;b&gt;Wash&lt;/b&gt;');
  });

  it('should refuse a gradebook link that is not a web address', () => {
    expect(() => teacherDigestMail({ ...input, classes: [{ ...input.classes[0], gradebookUrl: '/teacher' }] })).toThrow(
      'gradebookUrl must be an absolute http(s) address, but is "/teacher"',
    );
  });
});
