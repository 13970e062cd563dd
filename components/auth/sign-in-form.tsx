'use client';

import { signIn } from 'next-auth/react';
import { useRouter, useSearchParams } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import { signInMessage } from '@/lib/auth/sign-in-messages';

/** Where to go after signing in: only a path on this site, never another host. */
function safeCallback(value: string | null): string {
  if (!value) return '/';
  try {
    const url = new URL(value, window.location.origin);
    return url.origin === window.location.origin ? url.pathname + url.search : '/';
  } catch {
    return '/';
  }
}

export function SignInForm() {
  const router = useRouter();
  const params = useSearchParams();
  const [error, setError] = useState<string | undefined>(() => {
    const code = params.get('error');
    return code ? signInMessage(code) : undefined;
  });
  const [pending, setPending] = useState(false);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    setPending(true);
    setError(undefined);
    const result = await signIn('credentials', {
      email: String(form.get('email') ?? ''),
      password: String(form.get('password') ?? ''),
      redirect: false,
    });
    setPending(false);
    if (!result || result.error || !result.ok) {
      const code = result?.status === 429 ? 'RateLimited' : (result?.error ?? 'CredentialsSignin');
      setError(signInMessage(code));
      return;
    }
    router.replace(safeCallback(params.get('callbackUrl')));
    router.refresh();
  }

  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      <Field
        label="E-mail"
        name="email"
        type="email"
        autoComplete="username"
        required
        maxLength={254}
      />
      <Field
        label="Password"
        name="password"
        type="password"
        autoComplete="current-password"
        required
        maxLength={200}
      />
      <FormMessage tone="error" message={error} />
      <Button type="submit" disabled={pending} className="w-full">
        {pending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
