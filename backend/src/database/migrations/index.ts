import { CreateStudiosAndUsers1764633600000 } from './1764633600000-CreateStudiosAndUsers';
import { CreateTeachingDomain1764637200000 } from './1764637200000-CreateTeachingDomain';
import { AddWeeklyDigestPreference1764723600000 } from './1764723600000-AddWeeklyDigestPreference';
import { AddAttemptOverlayPlan1764810000000 } from './1764810000000-AddAttemptOverlayPlan';
import { AddAssignmentCells1764892800000 } from './1764892800000-AddAssignmentCells';
import { AddAssignmentStandings1764896400000 } from './1764896400000-AddAssignmentStandings';
import { AddInvitationRevokedAt1764900000000 } from './1764900000000-AddInvitationRevokedAt';
import { AddClassListStamps1764907200000 } from './1764907200000-AddClassListStamps';
import { CountTeacherPassOnRetakes1764910800000 } from './1764910800000-CountTeacherPassOnRetakes';

/** Every migration, oldest first. Listed by hand so no glob or folder path is needed at run time. */
export const migrations = [
  CreateStudiosAndUsers1764633600000,
  CreateTeachingDomain1764637200000,
  AddWeeklyDigestPreference1764723600000,
  AddAttemptOverlayPlan1764810000000,
  AddAssignmentCells1764892800000,
  AddAssignmentStandings1764896400000,
  AddInvitationRevokedAt1764900000000,
  AddClassListStamps1764907200000,
  CountTeacherPassOnRetakes1764910800000,
];
