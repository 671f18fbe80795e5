import { CreateStudiosAndUsers1764633600000 } from './1764633600000-CreateStudiosAndUsers';

/** Every migration, oldest first. Listed by hand so no glob or folder path is needed at run time. */
export const migrations = [CreateStudiosAndUsers1764633600000];
