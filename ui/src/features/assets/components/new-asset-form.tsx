import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Callout, Flex, Heading, Text, TextField } from '@radix-ui/themes';
import { useId } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import type { Asset } from '../../../types/api';
import { useCreateAsset } from '../api/create-asset';

const newAssetSchema = z.object({
  name: z.string().trim().min(1, { error: 'Give the asset a name.' }).max(120, { error: 'An asset name is at most 120 characters.' }),
  description: z.string().trim().max(2000, { error: 'A description is at most 2000 characters.' }),
});

type NewAssetValues = z.infer<typeof newAssetSchema>;

export interface NewAssetFormProps {
  /** Called with the new asset (e.g. to open its members). */
  onCreated?: (asset: Asset) => void;
}

/** Creates a field or project (global admin); the creator becomes its admin. Shows the server's refusal (a taken name). */
export function NewAssetForm({ onCreated }: NewAssetFormProps) {
  const id = useId();
  const createAsset = useCreateAsset();
  const {
    register,
    handleSubmit,
    reset,
    formState: { errors },
  } = useForm<NewAssetValues>({ resolver: zodResolver(newAssetSchema), defaultValues: { name: '', description: '' } });

  const onSubmit = handleSubmit((values) => {
    createAsset.mutate(
      { name: values.name, ...(values.description ? { description: values.description } : {}) },
      {
        onSuccess: (asset) => {
          reset();
          onCreated?.(asset);
        },
      },
    );
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby={`${id}-title`}>
      <Flex direction="column" gap="3">
        <Heading as="h3" size="3" id={`${id}-title`}>
          New asset
        </Heading>
        {createAsset.error ? (
          <Callout.Root color="tomato" size="1" role="alert">
            <Callout.Text>{createAsset.error.message}</Callout.Text>
          </Callout.Root>
        ) : null}
        {createAsset.isSuccess ? (
          <Text size="1" color="jade" role="status">
            Asset {createAsset.data.name} created; you are its admin.
          </Text>
        ) : null}
        <Flex gap="3" wrap="wrap" align="start">
          <Flex direction="column" gap="1" flexGrow="1" minWidth="180px">
            <Text as="label" htmlFor={`${id}-name`} size="2" weight="medium">
              Asset name
            </Text>
            <TextField.Root id={`${id}-name`} aria-invalid={errors.name ? true : undefined} aria-describedby={errors.name ? `${id}-name-error` : undefined} {...register('name')} />
            {errors.name ? (
              <Text id={`${id}-name-error`} size="1" color="tomato">
                {errors.name.message}
              </Text>
            ) : null}
          </Flex>
          <Flex direction="column" gap="1" flexGrow="2" minWidth="220px">
            <Text as="label" htmlFor={`${id}-description`} size="2" weight="medium">
              Description (optional)
            </Text>
            <TextField.Root
              id={`${id}-description`}
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
          <Flex direction="column" gap="1">
            <Text size="2" aria-hidden="true">
              &nbsp;
            </Text>
            <Button type="submit" loading={createAsset.isPending}>
              Create asset
            </Button>
          </Flex>
        </Flex>
      </Flex>
    </form>
  );
}
