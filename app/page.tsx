import { redirect } from 'next/navigation';
import { requirePageActor } from '@/lib/auth/current-actor';
import { homePathFor } from '@/lib/auth/home-path-for';

export const dynamic = 'force-dynamic';

export default async function Home() {
  redirect(homePathFor(await requirePageActor('/')));
}
