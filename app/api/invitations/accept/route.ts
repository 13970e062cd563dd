import { NextResponse } from 'next/server';
import { z } from 'zod';
import { acceptInvitation } from '@/lib/data/invitations';
import { handle, readJson } from '@/lib/http/handler';
import { parseInput } from '@/lib/validation/parse';

const tokenSchema = z.object({
  token: z.string({ error: 'The invitation token is required.' }).min(1).max(200),
});

/** Public: spend an invitation token, creating the account. { token, name, password, confirmPassword } */
export const POST = handle(async (request) => {
  const body = await readJson(request);
  const { token } = parseInput(tokenSchema, body);
  const result = await acceptInvitation(token, body);
  return NextResponse.json({ user: { id: result.userId, email: result.email } }, { status: 201 });
});
