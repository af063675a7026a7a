// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { act, cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { makePhoto } from '../../../testing/photo-fixtures';
import { fakePhotoApi } from '../testing/photo-test-support';
import { renderWithQueries } from '../../../testing/render';
import { PhotoLibrary } from './photo-library';
import { apiError } from '../../../testing/fake-api';

/** Stands in for the browser's XMLHttpRequest so a test can report progress and answer when it likes. */
class FakeXhr {
  static sent: FakeXhr[] = [];
  upload: { onprogress: ((e: Partial<ProgressEvent>) => void) | null } = { onprogress: null };
  onload: (() => void) | null = null;
  onerror: (() => void) | null = null;
  onabort: (() => void) | null = null;
  withCredentials = false;
  status = 0;
  responseText = '';
  method = '';
  url = '';
  headers: Record<string, string> = {};
  body: FormData | null = null;
  aborted = false;
  open(method: string, url: string) {
    this.method = method;
    this.url = url;
  }
  setRequestHeader(name: string, value: string) {
    this.headers[name] = value;
  }
  send(body: FormData) {
    this.body = body;
    FakeXhr.sent.push(this);
  }
  abort() {
    this.aborted = true;
    this.onabort?.();
  }
  progress(loaded: number, total: number) {
    act(() => this.upload.onprogress?.({ loaded, total, lengthComputable: true }));
  }
  /** Async: the uploader hears of the answer through a promise, so let it settle inside act. */
  async respond(status: number, body: unknown) {
    this.status = status;
    this.responseText = JSON.stringify(body);
    await act(async () => this.onload?.());
  }
}

beforeEach(() => {
  FakeXhr.sent = [];
  vi.stubGlobal('XMLHttpRequest', FakeXhr);
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const jpeg = (name: string) => new File([new Uint8Array(2048)], name, { type: 'image/jpeg' });
const row = (name: string) =>
  within(screen.getByRole('list', { name: 'Uploads' }))
    .getByText(name)
    .closest('li') as HTMLElement;

async function startWith(files: File[]) {
  const api = fakePhotoApi([]);
  const user = userEvent.setup();
  renderWithQueries(<PhotoLibrary restorationId={7} role="technician" />);
  await screen.findByText(/No photos yet/);
  await user.selectOptions(screen.getByLabelText('View'), 'underside');
  await user.type(screen.getByLabelText('Caption (optional)'), 'as received');
  await user.upload(screen.getByLabelText('Choose photos'), files);
  await waitFor(() => expect(FakeXhr.sent.length).toBeGreaterThan(0));
  return { user, ...api };
}

describe('photo uploader', () => {
  it('when three photos are picked, then two are sent at once with the batch fields and the third waits', async () => {
    await startWith([jpeg('a.jpg'), jpeg('b.jpg'), jpeg('c.jpg')]);
    expect(FakeXhr.sent).toHaveLength(2);
    const [first] = FakeXhr.sent;
    expect(first).toMatchObject({ method: 'POST', url: '/api/restorations/7/photos', withCredentials: true });
    expect(first?.headers).toEqual({ Accept: 'application/json' });
    expect(first?.body?.get('view')).toBe('underside');
    expect(first?.body?.get('phase')).toBe('before');
    expect(first?.body?.get('caption')).toBe('as received');
    expect(first?.body?.get('ownerVisible')).toBe('false');
    expect((first?.body?.get('file') as File).name).toBe('a.jpg');
    expect(within(row('c.jpg')).getByText('Queued')).toBeInTheDocument();

    first?.progress(1024, 4096);
    expect(within(row('a.jpg')).getByRole('progressbar', { name: 'Upload of a.jpg' })).toHaveValue(25);
    expect(within(row('a.jpg')).getByText('Sending… 25 %')).toBeInTheDocument();
  });

  it('when one finishes, then the queued one starts, the row says Added and the photo joins the gallery', async () => {
    const { calls } = await startWith([jpeg('a.jpg'), jpeg('b.jpg'), jpeg('c.jpg')]);
    await FakeXhr.sent[0]?.respond(201, makePhoto(41, { view: 'underside', caption: 'as received' }));

    expect(within(row('a.jpg')).getByText('Added')).toBeInTheDocument();
    await waitFor(() => expect(FakeXhr.sent).toHaveLength(3));
    expect(await screen.findByRole('button', { name: 'Underside, before: as received' })).toBeInTheDocument();

    await FakeXhr.sent[1]?.respond(201, makePhoto(42, { view: 'underside' }));
    await FakeXhr.sent[2]?.respond(201, makePhoto(43, { view: 'underside' }));
    // The batch is done: the list is fetched again once, for fresh URLs.
    await waitFor(() => expect(calls.filter((c) => c.method === 'GET')).toHaveLength(2));
  });

  it('when the server refuses, then its words are shown and Retry sends the file again', async () => {
    await startWith([jpeg('a.jpg')]);
    await FakeXhr.sent[0]?.respond(500, apiError(500, 'The photo store is not answering.').body);

    expect(within(row('a.jpg')).getByRole('alert')).toHaveTextContent('The photo store is not answering.');
    await userEvent.setup().click(screen.getByRole('button', { name: 'Retry a.jpg' }));
    await waitFor(() => expect(FakeXhr.sent).toHaveLength(2));
    expect(within(row('a.jpg')).queryByRole('alert')).not.toBeInTheDocument();
  });

  it('when a photo is too large, then the server’s message is shown and no pointless Retry is offered', async () => {
    await startWith([jpeg('huge.jpg')]);
    await FakeXhr.sent[0]?.respond(413, apiError(413, 'Photos can be at most 40 MB.').body);
    expect(within(row('huge.jpg')).getByRole('alert')).toHaveTextContent('Photos can be at most 40 MB.');
    expect(screen.queryByRole('button', { name: 'Retry huge.jpg' })).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Remove huge.jpg from the list' })).toBeInTheDocument();
  });

  it('when an upload is cancelled, then the request is aborted, the row says so and Retry starts it again', async () => {
    const { user } = await startWith([jpeg('a.jpg')]);
    await user.click(screen.getByRole('button', { name: 'Cancel upload of a.jpg' }));

    expect(FakeXhr.sent[0]?.aborted).toBe(true);
    expect(within(row('a.jpg')).getByText('Cancelled')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Retry a.jpg' })).toHaveFocus();
    await user.click(screen.getByRole('button', { name: 'Retry a.jpg' }));
    await waitFor(() => expect(FakeXhr.sent).toHaveLength(2));
  });

  it('when a file that is not a photo is dropped, then it is refused here without being sent', async () => {
    fakePhotoApi([]);
    renderWithQueries(<PhotoLibrary restorationId={7} role="technician" />);
    const zone = (await screen.findByText('Drop photos here')).parentElement as HTMLElement;
    const svg = new File(['<svg/>'], 'drawing.svg', { type: 'image/svg+xml' });
    fireEvent.drop(zone, { dataTransfer: { files: [svg], types: ['Files'] } });

    expect(await screen.findByText(/Not a photo Gridleak accepts/)).toBeInTheDocument();
    expect(FakeXhr.sent).toHaveLength(0);
  });
});
