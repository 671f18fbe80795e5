import Box from '@mui/material/Box';
import Skeleton from '@mui/material/Skeleton';
import { useEffect, useMemo } from 'react';
import { ErrorAlert } from '@/components/ui/error-alert';
import { useAttemptImage, type AttemptImage as Which } from '../api/get-attempt-image';

/** The stored photo or the overlay of what was measured and where, as an object URL. */
export function AttemptImage({ id, which, alt }: { id: string; which: Which; alt: string }) {
  const image = useAttemptImage({ id, which });
  const url = useMemo(() => (image.data ? URL.createObjectURL(image.data) : undefined), [image.data]);
  useEffect(() => () => {
    if (url) URL.revokeObjectURL(url);
  }, [url]);
  if (image.isPending) return <Skeleton variant="rectangular" height={240} aria-label={`Loading the ${which}`} />;
  if (image.isError) return <ErrorAlert error={image.error} onRetry={() => image.refetch()} />;
  return <Box component="img" src={url} alt={alt} sx={{ width: '100%', height: 'auto', borderRadius: 1, display: 'block' }} />;
}
