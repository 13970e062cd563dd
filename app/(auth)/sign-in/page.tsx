import { Suspense } from 'react';
import { SignInForm } from '@/components/auth/sign-in-form';

export const metadata = { title: 'Sign in' };

export default function SignInPage() {
  return (
    <>
      <h1 className="mb-4 text-sm text-stone-600">Sign in to the produce handling desk.</h1>
      <Suspense>
        <SignInForm />
      </Suspense>
    </>
  );
}
