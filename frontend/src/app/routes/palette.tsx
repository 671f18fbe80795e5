import { PageHeader } from '@/components/ui/page-header';
import { PaletteView } from '@/features/palette/components/palette-view';
import { getPaletteQueryOptions } from '@/features/palette/api/get-palette';
import { prefetchLoader } from '@/lib/route-loader';

export default function PaletteRoute() {
  return (
    <>
      <PageHeader title="My palette" subtitle="The paints you own, with their Colour Index pigment codes." />
      <PaletteView />
    </>
  );
}

/** Fills the cache before the page shows (see lib/route-loader.ts). */
export const loader = prefetchLoader(['student', 'teacher', 'admin'], (queryClient) => [queryClient.ensureQueryData(getPaletteQueryOptions())]);
