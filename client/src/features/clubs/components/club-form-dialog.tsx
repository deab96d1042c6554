import { useMutation } from '@apollo/client/react';
import { zodResolver } from '@hookform/resolvers/zod';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import { useTheme } from '@mui/material/styles';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useId, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { FormTextField } from '../../../components/ui/form-text-field.js';
import { applyServerErrors } from '../../../lib/apply-server-errors.js';
import { clubsDocuments } from '../api/clubs-documents.js';
import type { ClubDetail } from '../api/types.js';
import { CLUB_FORM_FIELDS, clubFormDefaults, clubFormSchema, toClubInput, type ClubFormValues } from '../schemas/club-form-schema.js';
import { ClubColours } from './club-colours.js';

export interface ClubFormDialogProps {
  /** The club to edit; leave out to add one (league administrators). */
  club?: ClubDetail;
  onClose: () => void;
  onDone: (message: string) => void;
}

/** A coach edits their club's name, short name, region, contact address and colours; an administrator adds a club. */
export function ClubFormDialog({ club, onClose, onDone }: ClubFormDialogProps) {
  const theme = useTheme();
  const fullScreen = useMediaQuery(theme.breakpoints.down('sm'), { noSsr: true });
  const titleId = useId();
  const [alert, setAlert] = useState<string>();
  const [update] = useMutation(clubsDocuments.updateClub, {
    refetchQueries: [...(club ? [{ query: clubsDocuments.club, variables: { id: club.id } }] : []), { query: clubsDocuments.clubs }],
    awaitRefetchQueries: true,
  });
  const [create] = useMutation(clubsDocuments.createClub, { refetchQueries: [{ query: clubsDocuments.clubs }], awaitRefetchQueries: true });
  const { register, control, handleSubmit, setError, formState } = useForm<ClubFormValues>({ resolver: zodResolver(clubFormSchema), defaultValues: clubFormDefaults(club) });
  const [primary, secondary] = useWatch({ control, name: ['colourPrimary', 'colourSecondary'] });
  const valid = (c: string) => (/^#[0-9a-fA-F]{6}$/.test(c) ? c : '#ffffff');

  const submit = handleSubmit(async (values) => {
    setAlert(undefined);
    const input = toClubInput(values);
    try {
      if (club) await update({ variables: { id: club.id, input } });
      else await create({ variables: { input } });
      onDone(club ? `${input.name} saved.` : `${input.name} added. Invite its coaches from the club page.`);
      onClose();
    } catch (error) {
      setAlert(applyServerErrors(error, { setError, fields: CLUB_FORM_FIELDS }));
    }
  });

  return (
    <Dialog open onClose={onClose} aria-labelledby={titleId} fullWidth maxWidth="sm" fullScreen={fullScreen}>
      <DialogTitle id={titleId}>{club ? 'Edit club details' : 'Add a club'}</DialogTitle>
      <DialogContent>
        <Stack component="form" id={`${titleId}-form`} noValidate onSubmit={submit} spacing={2.5} sx={{ pt: 1 }}>
          <FormAlert message={alert} />
          <FormTextField label="Club name" autoComplete="organization" registration={register('name')} fieldError={formState.errors.name} />
          <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2.5}>
            <FormTextField label="Short name" helperText="Shown beside results, in capitals" registration={register('shortName')} fieldError={formState.errors.shortName} slotProps={{ htmlInput: { maxLength: 16, style: { textTransform: 'uppercase' } } }} />
            <FormTextField label="Region" registration={register('region')} fieldError={formState.errors.region} sx={{ flex: 1 }} />
          </Stack>
          <FormTextField label="Contact e-mail (optional)" type="email" autoComplete="email" helperText="Shown to signed-in members" registration={register('contactEmail')} fieldError={formState.errors.contactEmail} />
          <Stack direction="row" spacing={2} sx={{ alignItems: 'flex-start' }}>
            <FormTextField label="First colour" type="color" registration={register('colourPrimary')} fieldError={formState.errors.colourPrimary} sx={{ width: 130 }} />
            <FormTextField label="Second colour" type="color" registration={register('colourSecondary')} fieldError={formState.errors.colourSecondary} sx={{ width: 130 }} />
            <Stack sx={{ pt: 1 }}>
              <ClubColours primary={valid(primary)} secondary={valid(secondary)} size={40} />
            </Stack>
          </Stack>
        </Stack>
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2, gap: 1 }}>
        <Button onClick={onClose} disabled={formState.isSubmitting}>Cancel</Button>
        <Button type="submit" form={`${titleId}-form`} variant="contained" loading={formState.isSubmitting}>{club ? 'Save' : 'Add club'}</Button>
      </DialogActions>
    </Dialog>
  );
}
