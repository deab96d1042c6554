import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import { Link as RouterLink } from 'react-router';

/** Secondary ways out of an account form ("forgotten your password?" and the like). */
export function AuthLinks({ links }: { links: ReadonlyArray<{ to: string; label: string }> }) {
  return (
    <Stack component="nav" aria-label="Other account options" spacing={0.5} sx={{ mt: 3 }}>
      {links.map((link) => (
        <Link key={link.to} component={RouterLink} to={link.to} sx={{ py: 1.25, alignSelf: 'flex-start' }}>
          {link.label}
        </Link>
      ))}
    </Stack>
  );
}
