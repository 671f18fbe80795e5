import Box from '@mui/material/Box';
import { useNavigation } from 'react-router-dom';

/**
 * A thin bar along the top while a link's page and its data load (the old page stays until the
 * new one is ready), with words for screen readers.
 */
export function NavigationProgress() {
  const navigation = useNavigation();
  if (navigation.state !== 'loading') return null;
  return (
    <Box
      role="progressbar"
      aria-label="Loading the page"
      sx={{
        position: 'fixed',
        top: 0,
        left: 0,
        right: 0,
        height: 3,
        zIndex: 1300,
        overflow: 'hidden',
        bgcolor: 'action.selected',
        '@keyframes mixmark-loading': {
          from: { transform: 'translateX(-100%)' },
          to: { transform: 'translateX(250%)' },
        },
        '&::after': {
          content: '""',
          position: 'absolute',
          inset: 0,
          width: '40%',
          bgcolor: 'primary.main',
          animation: 'mixmark-loading 1.1s ease-in-out infinite',
          '@media (prefers-reduced-motion: reduce)': { animation: 'none', width: '100%' },
        },
      }}
    />
  );
}
