import type { User } from '@/models';
import type { Role } from '@/lib/auth/roles';

/** A user as the API shows it to administrators (never the password hash). */
export interface UserRecord {
  id: number;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  createdAt: string;
  updatedAt: string;
}

/** The staff directory entry other signed-in staff may see. */
export interface DirectoryEntry {
  id: number;
  name: string;
  role: Role;
}

export function toUserRecord(u: User): UserRecord {
  return {
    id: u.id,
    email: u.email,
    name: u.name,
    role: u.role,
    active: Boolean(u.active),
    createdAt: new Date(u.createdAt).toISOString(),
    updatedAt: new Date(u.updatedAt).toISOString(),
  };
}

export const toDirectoryEntry = (u: User): DirectoryEntry => ({ id: u.id, name: u.name, role: u.role });
