import type { Metadata } from 'next';
import Link from 'next/link';
import { PublicSheet } from '@/components/delivery/PublicSheet';
import { PasswordResetRequestForm } from '@/components/delivery/PasswordResetRequestForm';

export const metadata: Metadata = { title: 'Reset password' };
export const dynamic = 'force-dynamic';

export default function PasswordResetPage() {
  return (
    <PublicSheet title="Reset your password">
      <PasswordResetRequestForm />
      <p className="mt-4 text-note">
        <Link href="/signin">Back to sign in</Link>
      </p>
    </PublicSheet>
  );
}
