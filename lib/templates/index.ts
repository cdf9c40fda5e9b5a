import type { MemoTemplate } from './template-types';
import { ssoDesignRationale } from './sso-design-rationale';
import { candidateTradeStudy } from './candidate-trade-study';
import { orbitMaintenancePlan } from './orbit-maintenance-plan';

export type { MemoTemplate } from './template-types';

/** Starting documents offered by "New memo", in the order shown. */
export const MEMO_TEMPLATES: readonly MemoTemplate[] = [ssoDesignRationale, candidateTradeStudy, orbitMaintenancePlan];

export const getTemplate = (id: string): MemoTemplate | undefined => MEMO_TEMPLATES.find((t) => t.id === id);

/** What the "New memo" form lists (no builders). */
export const listTemplates = () => MEMO_TEMPLATES.map(({ id, title, description }) => ({ id, title, description }));
