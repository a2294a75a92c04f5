import type { Router } from 'express';
import { authRouter } from './modules/auth/auth-router.ts';
import { equipmentRouter } from './modules/equipment/equipment-router.ts';
import { heatsRouter } from './modules/heats/heats-router.ts';
import { invitationsRouter } from './modules/invitations/invitations-router.ts';
import { photosRouter } from './modules/photos/photos-router.ts';
import { workshopsRouter } from './modules/workshops/workshops-router.ts';

/**
 * Every feature router mounted under /api, after CSRF protection. Each
 * module's router is its one entry point; add new ones here.
 */
export const API_ROUTERS: Router[] = [authRouter, workshopsRouter, invitationsRouter, equipmentRouter, heatsRouter, photosRouter];
