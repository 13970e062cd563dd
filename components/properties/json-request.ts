/** A JSON write to our own API; the answer's message (or a plain one) when it is refused. */
export async function sendJson(
  url: string,
  method: 'POST' | 'PUT',
  body: unknown,
): Promise<{ ok: true; data: Record<string, unknown> } | { ok: false; message: string }> {
  try {
    const response = await fetch(url, {
      method,
      headers: { 'content-type': 'application/json', accept: 'application/json' },
      body: JSON.stringify(body),
    });
    const data = await response.json().catch(() => ({}));
    if (response.ok) return { ok: true, data };
    const message = typeof data.message === 'string' ? data.message : null;
    return { ok: false, message: message ?? `The server answered ${response.status}; try again.` };
  } catch {
    return { ok: false, message: 'No answer from the server; check the connection and try again.' };
  }
}
