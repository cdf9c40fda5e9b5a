import bcrypt from 'bcryptjs';

/** bcrypt cost factor: 10 rounds (common practice default, no source). */
const ROUNDS = 10;

export const hashPassword = (plain: string): Promise<string> => bcrypt.hash(plain, ROUNDS);
export const verifyPassword = (plain: string, hash: string): Promise<boolean> => bcrypt.compare(plain, hash);
