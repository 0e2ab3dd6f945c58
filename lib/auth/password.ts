import bcrypt from 'bcryptjs';

// bcrypt with cost 10: about 60–80 ms a hash on this class of machine, the usual
// trade-off between sign-in latency and resistance to offline guessing.
const COST = 10;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, COST);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}
