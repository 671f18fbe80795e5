import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { attemptReply } from '@/testing/mocks/fixtures';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
import { PhotoUpload } from './photo-upload';

const drillId = '22222222-2222-4222-8222-222222222222';
const assignmentId = '44444444-4444-4444-8444-444444444444';

describe('PhotoUpload', () => {
  it('should open the back camera on a phone', () => {
    signInAs('student');
    const { container } = renderApp(<PhotoUpload drillId={drillId} onUploaded={vi.fn()} />);
    const input = container.querySelector('input[type=file]')!;
    expect(input).toHaveAttribute('accept', 'image/*');
    expect(input).toHaveAttribute('capture', 'environment');
  });

  it('should send the photo with the assignment and hand on the queued attempt', async () => {
    signInAs('student');
    let fields: Record<string, string> = {};
    server.use(
      http.post('*/api/attempts', async ({ request }) => {
        const form = await request.formData();
        // jsdom's multipart hand-over to MSW loses the file's name and bytes; check the part is there.
        fields = { assignmentId: String(form.get('assignmentId')), photo: form.has('photo') ? 'sent' : 'missing' };
        return HttpResponse.json(attemptReply({ state: 'queued', mark: null }), { status: 202 });
      }),
    );
    const onUploaded = vi.fn();
    const { container } = renderApp(<PhotoUpload drillId={drillId} assignmentId={assignmentId} onUploaded={onUploaded} />);
    const photo = new File(['jpeg-bytes'], 'swatch.jpg', { type: 'image/jpeg' });
    await userEvent.upload(container.querySelector('input[type=file]') as HTMLInputElement, photo);
    expect(screen.getByText(/Ready to send:/)).toHaveTextContent('swatch.jpg');
    await userEvent.click(screen.getByRole('button', { name: 'Send for marking' }));
    await waitFor(() => expect(onUploaded).toHaveBeenCalled());
    expect(fields).toEqual({ assignmentId, photo: 'sent' });
  });

  it("should show the server's words when the file is not a photo", async () => {
    signInAs('student');
    server.use(
      http.post('*/api/attempts', () =>
        HttpResponse.json(
          { statusCode: 415, code: 'FILE_UNSUPPORTED', message: 'This file is not a JPEG, PNG or WebP photo.', details: { photo: 'FILE_UNSUPPORTED' } },
          { status: 415 },
        ),
      ),
    );
    const { container } = renderApp(<PhotoUpload drillId={drillId} onUploaded={vi.fn()} />);
    await userEvent.upload(
      container.querySelector('input[type=file]') as HTMLInputElement,
      new File(['hello'], 'notes.txt', { type: 'text/plain' }),
      { applyAccept: false },
    );
    await userEvent.click(screen.getByRole('button', { name: 'Send for marking' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('This file is not a JPEG, PNG or WebP photo.');
  });
});
