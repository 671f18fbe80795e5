import { PageHeader } from '@/components/ui/page-header';
import { PaletteView } from '@/features/palette/components/palette-view';

export default function PaletteRoute() {
  return (
    <>
      <PageHeader title="My palette" subtitle="The paints you own, with their Colour Index pigment codes." />
      <PaletteView />
    </>
  );
}
