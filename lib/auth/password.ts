import bcrypt from 'bcryptjs';

const COST = 10;
let dummyHash: string | undefined;

export function hashPassword(plain: string): Promise<string> {
  return bcrypt.hash(plain, COST);
}

export function verifyPassword(plain: string, hash: string): Promise<boolean> {
  return bcrypt.compare(plain, hash);
}

/** Spend the time of a real comparison, so an unknown e-mail is not revealed by timing. */
export async function spendVerifyTime(plain: string): Promise<void> {
  dummyHash ??= await bcrypt.hash('not-a-password', COST);
  await bcrypt.compare(plain, dummyHash);
}
