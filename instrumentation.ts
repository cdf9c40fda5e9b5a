/**
 * Next.js calls register() once when the server starts (next start and
 * next dev). In the Node.js runtime it starts Nodewright's delivery services:
 * the local SMTP server when SMTP_URL is unset, and automatic retries.
 */
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  if (process.env.NEXT_PHASE === 'phase-production-build') return;
  const { startDeliveryServices } = await import('./lib/delivery/start-delivery-services');
  await startDeliveryServices();
}
