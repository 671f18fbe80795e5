import { fireEvent, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
import { AssignForm } from './assign-form';

const classId = '0b6f3e1a-2c4d-4e5f-8a9b-1c2d3e4f5a6b';
const drillId = '1c7a4f2b-3d5e-4f6a-9b0c-2d3e4f5a6b7c';

describe('AssignForm', () => {
  it('should refuse a due date in the past and keep what was typed', async () => {
    signInAs('teacher');
    let posted = 0;
    server.use(
      http.post('*/api/assignments', () => {
        posted += 1;
        return HttpResponse.json({}, { status: 201 });
      }),
    );
    renderApp(
      <AssignForm
        classes={[{ id: classId, name: 'Tuesday watercolour' }]}
        drills={[{ id: drillId, title: 'Sienna match' }]}
        defaultClassId={classId}
        defaultDrillId={drillId}
        onAssigned={vi.fn()}
      />,
    );
    fireEvent.change(screen.getByLabelText('Due'), { target: { value: '2020-01-10T18:00' } });
    await userEvent.type(screen.getByLabelText('Note for the students (optional)'), 'Use the warm red.');
    await userEvent.click(screen.getByRole('button', { name: 'Assign' }));
    expect(await screen.findByText('This due date has passed: choose a due date and time from now on.')).toBeInTheDocument();
    expect(posted).toBe(0);
    expect(screen.getByLabelText('Note for the students (optional)')).toHaveValue('Use the warm red.');
  });
});
