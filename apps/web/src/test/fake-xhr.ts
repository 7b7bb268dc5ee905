import { vi } from 'vitest';

// jsdom's XMLHttpRequest would go to the network. This one hands each request to `fetch` (which
// mockApi stubs), so the same handlers answer uploads with progress, and it reports upload
// progress the way a browser does. Bodies sent are kept for the test to look at.

export interface SentXhr {
  method: string;
  url: string;
  headers: Record<string, string>;
  body: unknown;
}

export function installFakeXhr() {
  const sent: SentXhr[] = [];

  class FakeXhr {
    status = 0;
    responseText = '';
    upload: { onprogress: ((event: ProgressEvent) => void) | null; onload: (() => void) | null } = {
      onprogress: null,
      onload: null,
    };
    onload: (() => void) | null = null;
    onerror: (() => void) | null = null;
    onabort: (() => void) | null = null;
    private method = 'GET';
    private url = '';
    private headers: Record<string, string> = {};

    open(method: string, url: string) {
      this.method = method;
      this.url = url;
    }

    setRequestHeader(name: string, value: string) {
      this.headers[name] = value;
    }

    abort() {
      this.onabort?.();
    }

    send(body: unknown) {
      sent.push({ method: this.method, url: this.url, headers: { ...this.headers }, body });
      const total = typeof body === 'string' ? body.length : 1000;
      this.upload.onprogress?.({
        lengthComputable: true,
        loaded: Math.floor(total / 2),
        total,
      } as ProgressEvent);
      this.upload.onprogress?.({ lengthComputable: true, loaded: total, total } as ProgressEvent);
      this.upload.onload?.();
      void fetch(this.url, {
        method: this.method,
        headers: this.headers,
        body: typeof body === 'string' ? body : undefined,
      }).then(
        async (response) => {
          this.status = response.status;
          this.responseText = await response.text();
          this.onload?.();
        },
        () => this.onerror?.(),
      );
    }
  }

  vi.stubGlobal('XMLHttpRequest', FakeXhr);
  return { sent };
}
