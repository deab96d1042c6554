import { useApolloClient, useMutation as useApolloMutation } from '@apollo/client/react';
import AddAPhoto from '@mui/icons-material/AddAPhoto';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useMutation } from '@tanstack/react-query';
import { useId, useRef, useState } from 'react';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { rackDocuments } from '../api/rack-documents.js';
import type { AxePhoto } from '../api/types.js';
import { PHOTO_TYPES, uploadPhoto } from '../api/upload-photo.js';

// The server keeps a copy at most 320 px wide for lists; the link opens the full photo.
const THUMB_WIDTH = 160;

export interface AxePhotosProps {
  axeId: string;
  label: string;
  photos: AxePhoto[];
  canManage: boolean;
}

export function AxePhotos({ axeId, label, photos, canManage }: AxePhotosProps) {
  const client = useApolloClient();
  const inputId = useId();
  const fileInput = useRef<HTMLInputElement>(null);
  const [caption, setCaption] = useState('');
  const refresh = () => client.refetchQueries({ include: [rackDocuments.axe] });
  const upload = useMutation({
    mutationFn: (file: File) => uploadPhoto(axeId, file, caption),
    onSuccess: async () => {
      setCaption('');
      if (fileInput.current) fileInput.current.value = '';
      await refresh();
    },
  });
  const [remove] = useApolloMutation(rackDocuments.removeAxePhoto, { refetchQueries: [rackDocuments.axe], awaitRefetchQueries: true });

  return (
    <Stack spacing={2}>
      {photos.length === 0 ? (
        <Typography sx={{ color: 'text.secondary' }}>
          {canManage ? 'No photos yet. Add one of each cheek and the edge, so the grind can be seen.' : 'No photos of this axe yet.'}
        </Typography>
      ) : (
        <Box component="ul" aria-label={`Photos of ${label}`} sx={{ display: 'flex', flexWrap: 'wrap', gap: 2, listStyle: 'none', p: 0, m: 0 }}>
          {photos.map((photo) => (
            <Box component="li" key={photo.id} sx={{ width: THUMB_WIDTH }}>
              <a href={photo.url} target="_blank" rel="noreferrer">
                <img
                  src={photo.thumbnailUrl}
                  width={THUMB_WIDTH}
                  height={Math.round((THUMB_WIDTH * photo.height) / photo.width)}
                  alt={photo.caption || `Photo of ${label}`}
                  loading="lazy"
                  style={{ objectFit: 'cover', borderRadius: 4, display: 'block' }}
                />
              </a>
              <Typography variant="body2">{photo.caption || ' '}</Typography>
              {canManage && (
                <Button size="small" color="error" onClick={() => void remove({ variables: { id: photo.id } })} aria-label={`Remove photo ${photo.caption || photo.id}`}>
                  Remove
                </Button>
              )}
            </Box>
          ))}
        </Box>
      )}
      {canManage && (
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'center' } }}>
          <TextField label="Caption (optional)" value={caption} onChange={(event) => setCaption(event.target.value)} slotProps={{ htmlInput: { maxLength: 200 } }} />
          <input
            ref={fileInput}
            id={inputId}
            type="file"
            accept={PHOTO_TYPES.join(',')}
            hidden
            aria-label="Photo file"
            onChange={(event) => {
              const file = event.target.files?.[0];
              if (file) upload.mutate(file);
            }}
          />
          <Button component="label" htmlFor={inputId} variant="outlined" startIcon={<AddAPhoto />} loading={upload.isPending}>
            Add photo
          </Button>
          <Typography variant="body2" sx={{ color: 'text.secondary' }}>
            JPEG, PNG or WebP up to 8 MB. Camera details and location are removed on upload.
          </Typography>
        </Stack>
      )}
      <FormAlert message={upload.error?.message} />
    </Stack>
  );
}
