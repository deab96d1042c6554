import { useMutation, useQuery } from '@apollo/client/react';
import Alert from '@mui/material/Alert';
import { useNavigate } from 'react-router';

import { PageLoading } from '../../../components/ui/page-loading.js';
import { paths } from '../../../config/paths.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { meetsDocuments } from '../api/meets-documents.js';
import { meetFormDefaults, toMeetInput, type MeetFormValues } from '../schemas/meet-form-schema.js';
import { MeetForm } from './meet-form.js';

/** Where the meet page picks up a message left by the page before it. */
export interface MeetPageState {
  notice?: string;
}

/** Builds a new meet (then sends the organiser on to add its events) or edits an existing one. */
export function MeetBuilder({ meetId }: { meetId?: string }) {
  const navigate = useNavigate();
  const options = useQuery(meetsDocuments.leagueOptions);
  const existing = useQuery(meetsDocuments.meet, { variables: { id: meetId ?? '' }, skip: !meetId });
  const [create] = useMutation(meetsDocuments.createMeet, { refetchQueries: ['Meets'] });
  const [update] = useMutation(meetsDocuments.updateMeet, { refetchQueries: ['Meets'] });

  const failed = options.error ?? existing.error;
  if (failed) {
    return (
      <Alert severity="error" role="alert">
        {graphQLErrorDetails(failed)[0]?.message}
      </Alert>
    );
  }
  if (!options.data || (meetId && !existing.data)) return <PageLoading label="Loading the meet builder" />;

  const meet = existing.data?.meet;
  const current = options.data.seasons.find((season) => season.isCurrent)?.id;
  const save = async (values: MeetFormValues) => {
    const input = toMeetInput(values);
    if (meet) {
      await update({ variables: { id: meet.id, input } });
      const state: MeetPageState = { notice: 'Meet details saved.' };
      void navigate(paths.meet.href(meet.id), { state });
    } else {
      const { data } = await create({ variables: { input } });
      const state: MeetPageState = { notice: 'Meet created as a draft. Add its events next, then open it for entries.' };
      if (data) void navigate(paths.meet.href(data.createMeet.id), { state });
    }
  };

  return (
    <MeetForm
      key={meet?.id ?? 'new'}
      defaults={meetFormDefaults(meet, current)}
      seasons={options.data.seasons}
      clubs={options.data.clubs}
      askReason={meet?.status === 'RUNNING' || meet?.status === 'PUBLISHED'}
      submitLabel={meet ? 'Save changes' : 'Create meet'}
      cancelHref={meet ? paths.meet.href(meet.id) : paths.meets.href()}
      onSave={save}
    />
  );
}
