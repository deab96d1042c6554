import Box from '@mui/material/Box';
import CircularProgress from '@mui/material/CircularProgress';

export function PageLoading({ label = 'Loading' }: { label?: string }) {
  return (
    <Box sx={{ display: 'grid', placeItems: 'center', py: 8 }}>
      <CircularProgress aria-label={label} />
    </Box>
  );
}
