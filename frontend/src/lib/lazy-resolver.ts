import type { FieldValues, Resolver } from 'react-hook-form';
import type { ObjectSchema } from 'yup';

export type LazyResolver<T extends FieldValues> = Resolver<T> & {
  /** Starts loading the checks (call it when the person starts on the form). */
  preload: () => Promise<unknown>;
};

/**
 * `yupResolver(schema)` for a form on a public page, with the schema (and yup with it) loaded
 * when the form is first used rather than with the page: the sign-in page then draws without
 * yup's ~12 KB gzip, and the checks are the same shared schema from `@mixmark/common`.
 * `loadSchema` should import a small module that re-exports the schema, so the bundler puts
 * the schema and yup in a chunk of their own. If the chunk cannot be loaded, the form gets a
 * root error in words instead of a silent failure; the next try loads it again.
 */
export function lazyYupResolver<T extends FieldValues>(
  loadSchema: () => Promise<ObjectSchema<T, any, any, any>>,
): LazyResolver<T> {
  let ready: Promise<Resolver<T>> | undefined;
  const preload = () =>
    (ready ??= Promise.all([loadSchema(), import('@hookform/resolvers/yup')]).then(
      ([schema, { yupResolver }]) => yupResolver(schema) as unknown as Resolver<T>,
      (error: unknown) => {
        ready = undefined;
        throw error;
      },
    ));
  const resolver: Resolver<T> = async (values, context, options) => {
    let check: Resolver<T>;
    try {
      check = await preload();
    } catch {
      return {
        values: {},
        errors: {
          root: {
            type: 'network_error',
            message:
              'Mixmark cannot reach its server to check this form. Check your connection and try again.',
          },
        },
      } as unknown as Awaited<ReturnType<Resolver<T>>>;
    }
    return check(values, context, options);
  };
  return Object.assign(resolver, { preload });
}
