import type { Metadata } from 'next';
import { requirePageActor } from '@/lib/auth/current-actor';
import { decideGlobal } from '@/lib/auth/permissions';
import { getOrganisation } from '@/lib/organisation/get-organisation';
import { OrganisationForm } from '@/components/organisation/OrganisationForm';
import { Problem } from '@/components/shell/Problem';

export const metadata: Metadata = { title: 'Organisation' };
export const dynamic = 'force-dynamic';

/** The issuing organisation the memo PDFs print; administrators only. */
export default async function OrganisationPage() {
  const actor = await requirePageActor('/admin/organisation');
  const d = decideGlobal(actor, 'organisation.manage');
  if (!d.allowed) return <Problem title="Not available to you" message={d.reason} />;
  return (
    <div className="max-w-2xl space-y-4">
      <h1 className="text-title font-semibold">Organisation</h1>
      <p className="text-note text-ink-soft">
        The name printed on the title page and in the header of every memo PDF, and the distribution statement under the
        title. Drafts and revisions frozen from now on print what is saved here; revisions already frozen keep the PDF
        they stored.
      </p>
      <OrganisationForm initial={await getOrganisation()} />
    </div>
  );
}
