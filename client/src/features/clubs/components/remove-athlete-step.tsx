import { useMutation } from '@apollo/client/react';
import Button from '@mui/material/Button';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import { useState } from 'react';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { clubsDocuments } from '../api/clubs-documents.js';
import type { Athlete } from '../api/types.js';

export interface RemoveAthleteStepProps {
  titleId: string;
  athlete: Athlete;
  onBack: () => void;
  onRemoved: (message: string) => void;
}

/** The confirm step of removing an athlete; the server refuses while meet entries exist and says so here. */
export function RemoveAthleteStep({ titleId, athlete, onBack, onRemoved }: RemoveAthleteStepProps) {
  const [problem, setProblem] = useState<string>();
  const [remove, { loading }] = useMutation(clubsDocuments.removeAthlete, {
    refetchQueries: [{ query: clubsDocuments.club, variables: { id: athlete.clubId } }],
    awaitRefetchQueries: true,
  });
  const confirm = async () => {
    setProblem(undefined);
    try {
      await remove({ variables: { id: athlete.id } });
      onRemoved(`${athlete.name} removed from the roster.`);
    } catch (error) {
      setProblem(graphQLErrorDetails(error).map((detail) => detail.message).join(' '));
    }
  };
  return (
    <>
      <DialogTitle id={titleId}>Remove {athlete.name}?</DialogTitle>
      <DialogContent>
        <DialogContentText sx={{ mb: problem ? 2 : 0 }}>
          {athlete.name} will be taken off the {athlete.clubName} roster. This cannot be undone; you can add them again later.
        </DialogContentText>
        <FormAlert message={problem} />
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2, gap: 1 }}>
        <Button onClick={onBack} disabled={loading}>
          Keep {athlete.firstName}
        </Button>
        <Button variant="contained" color="error" onClick={() => void confirm()} loading={loading}>
          Remove
        </Button>
      </DialogActions>
    </>
  );
}
