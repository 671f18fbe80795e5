import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC_KEY = 'isPublic';

/** Marks a route as open to anonymous callers once the global auth guard is in place. */
export const Public = () => SetMetadata(IS_PUBLIC_KEY, true);
