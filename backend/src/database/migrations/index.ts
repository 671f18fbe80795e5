import { CreateStudiosAndUsers1764633600000 } from './1764633600000-CreateStudiosAndUsers';
import { CreateTeachingDomain1764637200000 } from './1764637200000-CreateTeachingDomain';

/** Every migration, oldest first. Listed by hand so no glob or folder path is needed at run time. */
export const migrations = [CreateStudiosAndUsers1764633600000, CreateTeachingDomain1764637200000];
