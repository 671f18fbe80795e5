import DownloadOutlined from '@mui/icons-material/DownloadOutlined';
import PrintOutlined from '@mui/icons-material/PrintOutlined';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormLabel from '@mui/material/FormLabel';
import Radio from '@mui/material/Radio';
import RadioGroup from '@mui/material/RadioGroup';
import Skeleton from '@mui/material/Skeleton';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useEffect, useId, useMemo, useState } from 'react';
import { defaultPaper } from '@/components/cards/card-paper';
import { ErrorAlert } from '@/components/ui/error-alert';
import { useDownloadCardPdf, type CardPaper } from '../api/download-card-pdf';
import { useCardPreview } from '../api/get-card-preview';

function CardPreview({ drillId }: { drillId: string }) {
  const preview = useCardPreview({ drillId });
  const url = useMemo(() => (preview.data ? URL.createObjectURL(preview.data) : undefined), [preview.data]);
  useEffect(() => () => {
    if (url) URL.revokeObjectURL(url);
  }, [url]);
  if (preview.isPending) return <Skeleton variant="rectangular" height={160} aria-label="Loading the card preview" />;
  if (preview.isError) return <ErrorAlert error={preview.error} onRetry={() => preview.refetch()} />;
  return (
    <Box
      component="img"
      src={url}
      alt="Preview of the reference card: corner codes, white, grey and dark patches, and the window(s) to cut out"
      sx={{ width: '100%', maxWidth: 360, height: 'auto', display: 'block', border: 1, borderColor: 'divider', borderRadius: 1 }}
    />
  );
}

/** The drill's printable reference card: a preview, the paper size, the PDF and how to print it. */
export function ReferenceCard({ drillId }: { drillId: string }) {
  const [paper, setPaper] = useState<CardPaper>(defaultPaper);
  const download = useDownloadCardPdf({ drillId });
  const labelId = useId();
  return (
    <Stack spacing={2}>
      <Typography variant="h3" component="h2">
        Reference card
      </Typography>
      <CardPreview drillId={drillId} />
      <Stack direction="row" spacing={1} sx={{ alignItems: 'flex-start' }}>
        <PrintOutlined aria-hidden sx={{ mt: 0.25 }} />
        <Typography>
          <strong>Print at 100 %, no scaling, on matte paper; cut out the window(s).</strong> The card's own grey patches
          let Mixmark correct your photo's light, so a card printed larger or smaller, or on glossy paper, reads wrong.
        </Typography>
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'center' } }}>
        <Box>
          <FormLabel id={labelId}>Paper</FormLabel>
          <RadioGroup row aria-labelledby={labelId} value={paper} onChange={(e) => setPaper(e.target.value as CardPaper)}>
            <FormControlLabel value="A4" control={<Radio />} label="A4" />
            <FormControlLabel value="letter" control={<Radio />} label="US Letter" />
          </RadioGroup>
        </Box>
        <Button variant="contained" startIcon={<DownloadOutlined />} onClick={() => download.mutate(paper)} disabled={download.isPending}>
          {download.isPending ? 'Preparing the PDF…' : 'Download the card (PDF)'}
        </Button>
      </Stack>
      {download.isError && <ErrorAlert error={download.error} />}
    </Stack>
  );
}
