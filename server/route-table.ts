import { authRoutes } from './auth/auth.routes';
import { diagnosisRoutes } from './diagnoses/diagnoses.routes';
import { healthRoutes } from './health.routes';
import type { RouteDef } from './http/route';
import { inviteRoutes } from './invites/invites.routes';
import { jobRoutes } from './jobs/jobs.routes';
import { machineRoutes } from './machines/machines.routes';
import { mailRoutes } from './mail/mail.routes';
import { memberRoutes } from './members/members.routes';
import { meterRoutes } from './meters/meters.routes';
import { photoRoutes } from './photos/photos.routes';
import { procedurePictureRoutes } from './procedure-pictures/procedure-pictures.routes';
import { procedureRoutes } from './procedures/procedures.routes';
import { reportRoutes } from './report/report.routes';
import { commentRoutes } from './replays/comments.routes';
import { insightRoutes } from './replays/insight.routes';
import { practiceRoutes } from './replays/practice.routes';

/**
 * Every API route with the roles allowed to use it, in one place: app.ts mounts
 * it and the role × route denial tests are generated from it.
 * Fixed paths come before parameterised ones that could shadow them.
 */
export const routeTable: readonly RouteDef[] = [
  ...healthRoutes,
  ...authRoutes,
  ...inviteRoutes,
  ...memberRoutes,
  ...mailRoutes,
  ...machineRoutes,
  ...jobRoutes,
  ...meterRoutes,
  ...procedureRoutes,
  ...procedurePictureRoutes,
  ...diagnosisRoutes,
  ...photoRoutes,
  ...reportRoutes,
  ...commentRoutes,
  ...practiceRoutes,
  ...insightRoutes,
];
