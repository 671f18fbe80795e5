import { Studio } from '../studios/entities/studio.entity';
import { User } from '../users/entities/user.entity';

/** Every entity, for the DataSource used by the CLI and the seed (Nest modules register their own). */
export const entities = [Studio, User];
