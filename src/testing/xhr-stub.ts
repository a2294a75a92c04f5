import { act } from '@testing-library/react';
import { vi } from 'vitest';

/**
 * A stand-in for XMLHttpRequest, for the photo uploads (fetch has no upload
 * progress, so they do not go through the fetch stub). Each sent request is
 * recorded; the test then drives it: progress, an answer, a network failure.
 */
export class FakeXhr {
  method = '';
  url = '';
  headers: Record<string, string> = {};
  body: unknown = null;
  status = 0;
  responseText = '';
  withCredentials = false;
  aborted = false;
  upload: { onprogress: ((event: ProgressEvent) => void) | null } = { onprogress: null };
  onload: (() => void) | null = null;
  onerror: (() => void) | null = null;
  onabort: (() => void) | null = null;
  private responseHeaders: Record<string, string> = {};
  private readonly sent: FakeXhr[];

  constructor(sent: FakeXhr[]) {
    this.sent = sent;
  }

  open(method: string, url: string) {
    this.method = method;
    this.url = url;
  }
  setRequestHeader(name: string, value: string) {
    this.headers[name.toLowerCase()] = value;
  }
  getResponseHeader(name: string) {
    return this.responseHeaders[name.toLowerCase()] ?? null;
  }
  send(body: unknown) {
    this.body = body;
    this.sent.push(this);
  }
  abort() {
    this.aborted = true;
    this.onabort?.();
  }

  /** The file name in the multipart body. */
  get fileName(): string | undefined {
    return this.body instanceof FormData ? ((this.body.get('photos') as File | null)?.name ?? undefined) : undefined;
  }

  progress(loaded: number, total: number) {
    act(() => this.upload.onprogress?.({ loaded, total, lengthComputable: true } as ProgressEvent));
  }
  async respond(status: number, body: unknown, headers: Record<string, string> = {}) {
    await act(async () => {
      this.status = status;
      this.responseText = JSON.stringify(body);
      this.responseHeaders = Object.fromEntries(Object.entries(headers).map(([k, v]) => [k.toLowerCase(), v]));
      this.onload?.();
    });
  }
  async failNetwork() {
    await act(async () => this.onerror?.());
  }
}

/** Replaces XMLHttpRequest for one test; `sent` lists the requests in the order they went. */
export function stubXhr() {
  const sent: FakeXhr[] = [];
  vi.stubGlobal(
    'XMLHttpRequest',
    class extends FakeXhr {
      constructor() {
        super(sent);
      }
    },
  );
  return { sent, last: () => sent[sent.length - 1], named: (name: string) => sent.filter((x) => x.fileName === name) };
}
