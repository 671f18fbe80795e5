import type { DrillKind } from '@mixmark/common';
import DownloadOutlined from '@mui/icons-material/DownloadOutlined';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { ErrorAlert } from '@/components/ui/error-alert';
import { paperWords, papersInOrder, type CardPaper } from './card-paper';
import { useDownloadKindCardPdf } from './download-kind-card';

/**
 * One download button per paper size (the local one first, filled), for a card PDF fetched
 * through the API client; the failure, if any, in words below.
 */
export function CardPdfButtons({
  what,
  onDownload,
  pending,
  error,
}: {
  /** What the card is, as the buttons name it: "this drill's card", "a match card". */
  what: string;
  onDownload: (paper: CardPaper) => void;
  pending: boolean;
  error?: unknown;
}) {
  const [asked, setAsked] = useState<CardPaper>();
  return (
    <Stack spacing={1} sx={{ alignItems: 'flex-start', mt: 1 }}>
      <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }}>
        {papersInOrder().map((paper, index) => (
          <Button
            key={paper}
            variant={index === 0 ? 'contained' : 'outlined'}
            size="small"
            startIcon={<DownloadOutlined />}
            disabled={pending}
            onClick={() => {
              setAsked(paper);
              onDownload(paper);
            }}
          >
            {pending && asked === paper
              ? 'Preparing the PDF…'
              : `Download ${what} (PDF, ${paperWords[paper]})`}
          </Button>
        ))}
      </Stack>
      {error ? <ErrorAlert error={error} /> : null}
    </Stack>
  );
}

/** The card PDF for a kind of drill (no drill needed), in A4 or US Letter. */
export function KindCardButtons({
  kind,
  steps,
  what,
}: {
  kind: DrillKind;
  steps?: number;
  what: string;
}) {
  const download = useDownloadKindCardPdf();
  return (
    <CardPdfButtons
      what={what}
      pending={download.isPending}
      error={download.isError ? download.error : undefined}
      onDownload={(paper) => download.mutate({ kind, steps, paper })}
    />
  );
}
