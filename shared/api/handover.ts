import type { LoginPlan } from '@/shared/handover/login-plan';

/** `GET /api/designs/:id/versions/:n/login-plan` (docs/api.md). */
export type LoginPlanResponse = LoginPlan;
