import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Callout, Dialog, Flex, Text, TextArea } from '@radix-ui/themes';
import { useId, useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { TextFormField } from '../../../components/text-form-field';
import { serverFieldErrors } from '../../../lib/server-field-errors';
import type { Asset } from '../../../types/api';
import { useUpdateAsset } from '../api/update-asset';

const LABELS = { name: 'Asset name', description: 'Description' } as const;

type Field = keyof typeof LABELS;

const editAssetSchema = z.object({
  name: z.string().trim().min(1, { error: 'Give the asset a name.' }).max(120, { error: 'An asset name is at most 120 characters.' }),
  description: z.string().trim().max(2000, { error: 'A description is at most 2000 characters.' }),
});

type EditAssetValues = z.infer<typeof editAssetSchema>;

export interface EditAssetDialogProps {
  asset: Pick<Asset, 'id' | 'name' | 'description'>;
}

/**
 * Renames or re-describes an asset (asset admin). Only changed fields are sent, in one request,
 * so nothing is half-saved; the service's refusals (a taken name) show under the field.
 */
export function EditAssetDialog({ asset }: EditAssetDialogProps) {
  const id = useId();
  const [open, setOpen] = useState(false);
  const update = useUpdateAsset(asset.id);
  const initial = { name: asset.name, description: asset.description ?? '' };
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors },
  } = useForm<EditAssetValues>({ resolver: zodResolver(editAssetSchema), defaultValues: initial });

  const onSubmit = handleSubmit((values) => {
    const input = {
      ...(values.name !== asset.name ? { name: values.name } : {}),
      ...(values.description !== (asset.description ?? '') ? { description: values.description } : {}),
    };
    if (!Object.keys(input).length) return setOpen(false);
    update.mutate(input, {
      onSuccess: () => setOpen(false),
      onError: (error) => {
        const { fields } = serverFieldErrors(error, LABELS);
        for (const [field, message] of Object.entries(fields) as [Field, string][]) setError(field, { type: 'server', message });
      },
    });
  });
  const other = update.error ? serverFieldErrors(update.error, LABELS).other : [];

  return (
    <Dialog.Root
      open={open}
      onOpenChange={(o) => {
        setOpen(o);
        if (o) {
          reset(initial);
          update.reset();
        }
      }}
    >
      <Dialog.Trigger>
        <Button size="1" variant="soft" color="gray" aria-label={`Edit ${asset.name}`}>
          Edit
        </Button>
      </Dialog.Trigger>
      <Dialog.Content maxWidth="480px">
        <Dialog.Title>Edit {asset.name}</Dialog.Title>
        <Dialog.Description size="2" color="gray">
          The new name shows everywhere the asset is listed; the change is recorded in the asset's audit log.
        </Dialog.Description>
        <form onSubmit={onSubmit} noValidate aria-label={`Edit ${asset.name}`}>
          <Flex direction="column" gap="3" mt="3">
            {other.length ? (
              <Callout.Root color="tomato" size="1" role="alert">
                <Callout.Text>{other.join(' ')}</Callout.Text>
              </Callout.Root>
            ) : null}
            <TextFormField id={`${id}-name`} label={LABELS.name} error={errors.name?.message} registration={register('name')} />
            <Flex direction="column" gap="1">
              <Text as="label" htmlFor={`${id}-description`} size="2" weight="medium">
                {LABELS.description}
              </Text>
              <TextArea
                id={`${id}-description`}
                rows={3}
                aria-invalid={errors.description ? true : undefined}
                aria-describedby={errors.description ? `${id}-description-error` : undefined}
                {...register('description')}
              />
              {errors.description ? (
                <Text id={`${id}-description-error`} size="1" color="tomato">
                  {errors.description.message}
                </Text>
              ) : null}
            </Flex>
            <Flex gap="2" justify="end">
              <Dialog.Close>
                <Button type="button" variant="soft" color="gray">
                  Cancel
                </Button>
              </Dialog.Close>
              <Button type="submit" loading={update.isPending}>
                Save asset
              </Button>
            </Flex>
          </Flex>
        </form>
      </Dialog.Content>
    </Dialog.Root>
  );
}
