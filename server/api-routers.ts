import type { Router } from 'express';
import { alloysRouter } from './modules/alloys/alloys-router.ts';
import { authRouter } from './modules/auth/auth-router.ts';
import { commentsRouter } from './modules/comments/comments-router.ts';
import { diagnosisRouter } from './modules/diagnosis/diagnosis-router.ts';
import { equipmentRouter } from './modules/equipment/equipment-router.ts';
import { heatTreatmentRouter } from './modules/heat-treatment/heat-treatment-router.ts';
import { heatsRouter } from './modules/heats/heats-router.ts';
import { insightsRouter } from './modules/insights/insights-router.ts';
import { invitationsRouter } from './modules/invitations/invitations-router.ts';
import { notificationsRouter } from './modules/notifications/notifications-router.ts';
import { photosRouter } from './modules/photos/photos-router.ts';
import { reportsRouter } from './modules/reports/reports-router.ts';
import { rulesRouter } from './modules/rules/rules-router.ts';
import { workshopsRouter } from './modules/workshops/workshops-router.ts';

/**
 * Every feature router mounted under /api, after CSRF protection. Each
 * module's router is its one entry point; add new ones here.
 */
export const API_ROUTERS: Router[] = [authRouter, workshopsRouter, invitationsRouter, equipmentRouter, heatsRouter, photosRouter, alloysRouter, insightsRouter, heatTreatmentRouter, diagnosisRouter, rulesRouter, reportsRouter, commentsRouter, notificationsRouter];
