import { useMutation } from '@apollo/client/react';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import { useState } from 'react';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { graphQLErrorDetails } from '../../../lib/graphql-error-details.js';
import { resultsDocuments } from '../api/results-documents.js';

export interface PublishResultsButtonProps {
  meetId: string;
  meetName: string;
  onPublished(message: string): void;
}

/** Publishing opens the results to everyone and mails the coaches, so it asks first. */
export function PublishResultsButton({ meetId, meetName, onPublished }: PublishResultsButtonProps) {
  const [open, setOpen] = useState(false);
  const [problem, setProblem] = useState<string>();
  const [publish, { loading }] = useMutation(resultsDocuments.publishMeetResults, {
    refetchQueries: [{ query: resultsDocuments.meetResults, variables: { meetId } }],
    awaitRefetchQueries: true,
  });
  const confirm = async () => {
    setProblem(undefined);
    try {
      const { data } = await publish({ variables: { meetId } });
      const mailed = data?.publishMeetResults.coachesMailed ?? 0;
      setOpen(false);
      onPublished(`Results published. ${mailed} ${mailed === 1 ? 'coach was' : 'coaches were'} e-mailed their placings.`);
    } catch (error) {
      setProblem(graphQLErrorDetails(error).map((detail) => detail.message).join(' '));
    }
  };
  return (
    <>
      <Button variant="contained" onClick={() => setOpen(true)}>
        Publish results
      </Button>
      <Dialog open={open} onClose={() => setOpen(false)} aria-labelledby="publish-title">
        <DialogTitle id="publish-title">Publish the results of {meetName}?</DialogTitle>
        <DialogContent>
          <DialogContentText>
            Everyone will be able to read them, and each entered club&apos;s coaches get an e-mail with their placings.
            After publishing, a result changes only with a correction that says why; every correction is kept on record.
          </DialogContentText>
          <FormAlert message={problem} />
        </DialogContent>
        <DialogActions>
          <Button onClick={() => setOpen(false)}>Not yet</Button>
          <Button variant="contained" onClick={() => void confirm()} loading={loading}>
            Publish results
          </Button>
        </DialogActions>
      </Dialog>
    </>
  );
}
