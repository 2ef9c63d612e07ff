/** Password hashing with bcrypt (bcryptjs, cost 11). */
import bcrypt from 'bcryptjs';

const COST = 11;

export function hashPassword(plain: string): Promise<string> {
  return bcrypt.hash(plain, COST);
}

export function verifyPassword(plain: string, hash: string): Promise<boolean> {
  return bcrypt.compare(plain, hash);
}

/** A hash of a random string: compared against when the account does not exist, so timing does not reveal it. */
export const DUMMY_HASH = '$2b$11$az8gJKGJEFCYejDxRLJMsuHj.UVDAssRmNBx/4WftbsWS3QDxJt86';
