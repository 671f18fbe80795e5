import { Assignment } from '../assignments/entities/assignment.entity';
import { Attempt } from '../attempts/entities/attempt.entity';
import { PasswordReset } from '../auth/entities/password-reset.entity';
import { RefreshToken } from '../auth/entities/refresh-token.entity';
import { ClassMember } from '../classes/entities/class-member.entity';
import { Invitation } from '../classes/entities/invitation.entity';
import { StudioClass } from '../classes/entities/studio-class.entity';
import { Drill } from '../drills/entities/drill.entity';
import { Paint } from '../palettes/entities/paint.entity';
import { Studio } from '../studios/entities/studio.entity';
import { User } from '../users/entities/user.entity';

/** Every entity, for the DataSource used by the app, the CLI and the seed. */
export const entities = [
  Studio,
  User,
  RefreshToken,
  PasswordReset,
  StudioClass,
  ClassMember,
  Invitation,
  Drill,
  Assignment,
  Attempt,
  Paint,
];
