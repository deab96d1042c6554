import Stack from '@mui/material/Stack';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { SearchView } from '../../../features/search/components/search-view.js';

export function SearchPage() {
  return (
    <Stack spacing={1}>
      <PageHeading lead="Findings, guides and safety notes. Ask the way you would ask your coach; small spelling slips are forgiven.">Search</PageHeading>
      <SearchView />
    </Stack>
  );
}
