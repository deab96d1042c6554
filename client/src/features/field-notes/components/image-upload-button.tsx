import AddPhotoAlternateIcon from '@mui/icons-material/AddPhotoAlternate';
import Button from '@mui/material/Button';
import { useMutation } from '@tanstack/react-query';
import { useId, useRef } from 'react';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { IMAGE_TYPES, uploadImage } from '../api/upload-image.js';

/** Uploads a picture (checked and cleaned by the server) and hands its markdown to the editor. */
export function ImageUploadButton({ onUploaded }: { onUploaded: (markdown: string) => void }) {
  const inputId = useId();
  const input = useRef<HTMLInputElement>(null);
  const upload = useMutation({
    mutationFn: (file: File) => uploadImage(file, file.name.replace(/\.[a-z0-9]+$/i, '').replace(/[-_]+/g, ' ')),
    onSuccess: (image) => {
      onUploaded(image.markdown);
      if (input.current) input.current.value = '';
    },
  });
  return (
    <>
      <input
        ref={input}
        id={inputId}
        type="file"
        accept={IMAGE_TYPES.join(',')}
        hidden
        onChange={(event) => {
          const file = event.target.files?.[0];
          if (file) upload.mutate(file);
        }}
      />
      <Button component="label" htmlFor={inputId} startIcon={<AddPhotoAlternateIcon />} loading={upload.isPending} sx={{ minHeight: 44 }}>
        Add a picture
      </Button>
      <FormAlert message={upload.error?.message} />
    </>
  );
}
