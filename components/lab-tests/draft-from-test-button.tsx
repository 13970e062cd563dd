'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';

/** Start a draft revision from an uploaded test (POST `endpoint`, body `{}`), then open it. */
export function DraftFromTestButton({ endpoint, label }: { endpoint: string; label: string }) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [message, setMessage] = useState<string>();

  async function start() {
    setPending(true);
    setMessage(undefined);
    try {
      const response = await fetch(endpoint, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: '{}',
      });
      const body = await response.json().catch(() => null);
      if (response.ok && body?.revision?.href) {
        router.push(body.revision.href);
        return;
      }
      setMessage(body?.message ?? `The draft was not started (HTTP ${response.status}).`);
    } catch {
      setMessage('The request did not reach the server; try again.');
    }
    setPending(false);
  }

  return (
    <div className="space-y-2">
      <Button type="button" onClick={start} disabled={pending} aria-busy={pending}>
        {pending ? 'Starting the draft…' : label}
      </Button>
      <FormMessage tone="error" message={message} />
    </div>
  );
}
