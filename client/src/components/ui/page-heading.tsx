import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';

export interface PageHeadingProps {
  /** The page's one <h1>; a plain string also becomes the browser tab's title. */
  children: ReactNode;
  /** A line underneath saying what the page is for. */
  lead?: ReactNode;
  /** A smaller heading for narrow form pages, where a long title would wrap into three lines. */
  compact?: boolean;
}

export function PageHeading({ children, lead, compact = false }: PageHeadingProps) {
  return (
    <header>
      {typeof children === 'string' && <title>{`${children} · Endgrain`}</title>}
      <Typography variant="h1" sx={{ mb: lead ? 1 : 3, ...(compact && { fontSize: 'clamp(1.6rem, 1.4rem + 1vw, 2rem)' }) }}>
        {children}
      </Typography>
      {lead && (
        <Typography variant="body1" sx={{ color: 'text.secondary', mb: 3, maxWidth: '65ch' }}>
          {lead}
        </Typography>
      )}
    </header>
  );
}
