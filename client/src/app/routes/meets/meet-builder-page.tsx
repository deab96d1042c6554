import { useParams } from 'react-router';

import { PageHeading } from '../../../components/ui/page-heading.js';
import { MeetBuilder } from '../../../features/meets/components/meet-builder.js';

/** `/meets/new` and `/meets/:meetId/edit`; organisers only (the route guard and the server both check). */
export function MeetBuilderPage() {
  const { meetId } = useParams();
  return (
    <>
      <PageHeading
        lead={
          meetId
            ? 'Change the meet details and its scoring. Events are edited on the meet page.'
            : 'Start with the details and the scoring. The meet stays a draft, visible to organisers only, until you open it for entries.'
        }
      >
        {meetId ? 'Edit meet' : 'New meet'}
      </PageHeading>
      <MeetBuilder key={meetId ?? 'new'} meetId={meetId} />
    </>
  );
}
