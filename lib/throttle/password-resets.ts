import { RateLimiterRes } from 'rate-limiter-flexible';
import { ApiError } from '@/lib/api/errors';
import { LIMITS, describeRetry, limiterFor, type Limit } from './throttle-limits';

async function consumeOrRefuse(limit: Limit, key: string, refusal: string): Promise<void> {
  try {
    await limiterFor(limit).consume(key);
  } catch (err) {
    if (!(err instanceof RateLimiterRes)) throw err;
    const retryAt = new Date(Date.now() + Math.max(err.msBeforeNext, 1000));
    throw new ApiError('too_many_requests', `${refusal} ${describeRetry(retryAt)}`, {
      details: { retryAt: retryAt.toISOString() },
    });
  }
}

/**
 * Counts one password-reset request against the client address and the
 * e-mail address as typed, or refuses it with a 429 saying when to try
 * again. The e-mail's count is kept whether or not it has an account, so the
 * refusal tells nothing about which addresses exist.
 */
export async function assertPasswordResetAllowed(request: { email: string; clientAddress: string }): Promise<void> {
  await consumeOrRefuse(
    LIMITS.passwordResetsPerAddress,
    request.clientAddress,
    'Too many password-reset requests from your network address.',
  );
  await consumeOrRefuse(
    LIMITS.passwordResetsPerAccount,
    request.email.trim().toLowerCase().slice(0, 200),
    'Too many password-reset requests for this e-mail address.',
  );
}
