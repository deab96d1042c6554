import { useMutation } from '@apollo/client/react';
import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import FormLabel from '@mui/material/FormLabel';
import Stack from '@mui/material/Stack';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import { useId, useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { z } from 'zod';

import { FormAlert } from '../../../components/ui/form-alert.js';
import { FormTextField } from '../../../components/ui/form-text-field.js';
import { SubmitButton } from '../../../components/ui/submit-button.js';
import { applyServerErrors } from '../../../lib/apply-server-errors.js';
import { authDocuments } from '../api/auth-documents.js';
import type { User } from '../api/types.js';
import { fieldRules } from '../schemas/field-rules.js';

const schema = z.object({
  displayName: fieldRules.displayName,
  unitSystem: z.enum(['METRIC', 'IMPERIAL']),
});
type Values = z.infer<typeof schema>;

export function PreferencesForm({ user }: { user: User }) {
  const [update] = useMutation(authDocuments.updateMyPreferences);
  const [alert, setAlert] = useState<string>();
  const [saved, setSaved] = useState(false);
  const unitsLabelId = useId();
  const { register, control, handleSubmit, setError, reset, formState } = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: { displayName: user.displayName, unitSystem: user.unitSystem },
  });

  const submit = handleSubmit(async (values) => {
    setAlert(undefined);
    setSaved(false);
    try {
      const { data } = await update({ variables: values });
      // The answer updates the cached user everywhere; the form starts again from it.
      if (data) reset({ displayName: data.updateMyPreferences.displayName, unitSystem: data.updateMyPreferences.unitSystem });
      setSaved(true);
    } catch (error) {
      setAlert(applyServerErrors(error, { setError, fields: ['displayName', 'unitSystem'] }));
    }
  });

  return (
    <Stack component="form" noValidate onSubmit={submit} spacing={2.5} sx={{ maxWidth: 520 }}>
      <FormAlert message={alert} />
      <FormTextField
        label="Display name"
        autoComplete="nickname"
        registration={register('displayName')}
        fieldError={formState.errors.displayName}
      />
      <Stack spacing={1}>
        <FormLabel id={unitsLabelId}>Units for lengths and weights</FormLabel>
        <Controller
          control={control}
          name="unitSystem"
          render={({ field }) => (
            <ToggleButtonGroup
              exclusive
              color="primary"
              aria-labelledby={unitsLabelId}
              value={field.value}
              onChange={(_event, value: Values['unitSystem'] | null) => value && field.onChange(value)}
            >
              <ToggleButton value="METRIC">Metric (mm, kg)</ToggleButton>
              <ToggleButton value="IMPERIAL">Imperial (in, lb)</ToggleButton>
            </ToggleButtonGroup>
          )}
        />
      </Stack>
      {saved && (
        <Alert severity="success" role="status">
          Saved.
        </Alert>
      )}
      <SubmitButton pending={formState.isSubmitting}>Save</SubmitButton>
    </Stack>
  );
}
