import Module, { createRequire } from 'node:module';
import { vi } from 'vitest';

/**
 * next/headers outside a Next request: tests say which headers (and cookies) the current request
 * carries. next-auth's route handler and server actions read them from here.
 */
export const requestState: {
  headers: Headers;
  /** cookies the code under test set on its answer, in order */
  setCookies: { name: string; value: string; options: Record<string, unknown> }[];
} = { headers: new Headers(), setCookies: [] };

function parseCookies(header: string | null) {
  return (header ?? '')
    .split(';')
    .map((part) => part.trim())
    .filter(Boolean)
    .map((part) => {
      const cut = part.indexOf('=');
      return { name: part.slice(0, cut), value: decodeURIComponent(part.slice(cut + 1)) };
    });
}

const fakeHeaders = {
  headers: async () => requestState.headers,
  cookies: async () => {
    const all = parseCookies(requestState.headers.get('cookie'));
    return {
      get: (name: string) => all.find((c) => c.name === name),
      getAll: () => all,
      set: (name: string, value: string, options: Record<string, unknown> = {}) => {
        requestState.setCookies.push({ name, value, options });
      },
    };
  },
};

vi.mock('next/headers', () => fakeHeaders);

// next-auth loads next/headers with require(), which vi.mock does not reach: seed Node's module
// cache with the same stand-in.
const require = createRequire(import.meta.url);
const id = require.resolve('next/headers');
const stand = new Module(id);
stand.filename = id;
stand.loaded = true;
stand.exports = fakeHeaders;
require.cache[id] = stand;

/** The headers the next server action or next-auth call sees (for example a foreign Origin). */
export function setRequestHeaders(init: Record<string, string> = {}) {
  requestState.headers = new Headers(init);
  requestState.setCookies = [];
}
