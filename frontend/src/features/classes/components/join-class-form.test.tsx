import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
import { JoinClassForm } from './join-class-form';

describe('JoinClassForm', () => {
  it('should explain what a class code looks like', async () => {
    signInAs('student');
    renderApp(<JoinClassForm />);
    await userEvent.type(screen.getByLabelText('Class code'), 'ABC');
    await userEvent.click(screen.getByRole('button', { name: 'Join the class' }));
    expect(await screen.findByText(/A class code is 6 letters and digits/)).toBeInTheDocument();
  });

  it('should send the code tidied up and say which class was joined', async () => {
    signInAs('student');
    let code: unknown;
    server.use(
      http.post('*/api/classes/join', async ({ request }) => {
        code = ((await request.json()) as { code: string }).code;
        return HttpResponse.json({ id: 'c1', name: 'Thursday watercolour', code: 'K7M2QX', teacher: { id: 't', displayName: 'Marta Ocheltree' }, archived: false, studentCount: 3, createdAt: '' });
      }),
    );
    renderApp(<JoinClassForm />);
    await userEvent.type(screen.getByLabelText('Class code'), 'k7m-2qx');
    await userEvent.click(screen.getByRole('button', { name: 'Join the class' }));
    expect(await screen.findByText('You joined Thursday watercolour (Marta Ocheltree).')).toBeInTheDocument();
    expect(code).toBe('K7M2QX');
  });

  it('should put an unknown code beside the field', async () => {
    signInAs('student');
    server.use(
      http.post('*/api/classes/join', () =>
        HttpResponse.json({ statusCode: 404, code: 'class_code_unknown', message: 'No open class has this code.', details: { code: 'unknown' } }, { status: 404 }),
      ),
    );
    renderApp(<JoinClassForm />);
    await userEvent.type(screen.getByLabelText('Class code'), 'K7M2QX');
    await userEvent.click(screen.getByRole('button', { name: 'Join the class' }));
    expect(await screen.findByText('No open class has this code. Check it with your teacher.')).toBeInTheDocument();
  });
});
