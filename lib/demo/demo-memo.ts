import type { TiptapDoc } from '@/lib/memos/memo-schema';
import { ssoDesignRationale } from '@/lib/templates/sso-design-rationale';

export const DEMO_MEMO = {
  documentNumber: 'BWO-TL1-DM-001',
  title: 'TERNLIGHT-1 orbit design rationale',
};

/** The demo memo: the design-rationale template, as the invented analyst started it. */
export function demoMemoContent(): TiptapDoc {
  return ssoDesignRationale.build();
}
