import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Callout, Flex, Heading, Text, TextField } from '@radix-ui/themes';
import { useId } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { useCreateWell } from '../api/create-well';

const newWellSchema = z.object({
  name: z.string().trim().min(1, { error: 'Give the well a name.' }).max(80, { error: 'A well name is at most 80 characters.' }),
  uwi: z.string().trim().max(40, { error: 'A UWI is at most 40 characters.' }),
});

type NewWellValues = z.infer<typeof newWellSchema>;

export interface NewWellFormProps {
  assetId: string;
}

/** Creates a well in the asset (name, optional UWI); shows the server's refusal (e.g. a taken name). */
export function NewWellForm({ assetId }: NewWellFormProps) {
  const id = useId();
  const createWell = useCreateWell(assetId);
  const {
    register,
    handleSubmit,
    reset,
    formState: { errors },
  } = useForm<NewWellValues>({ resolver: zodResolver(newWellSchema), defaultValues: { name: '', uwi: '' } });

  const onSubmit = handleSubmit((values) => {
    createWell.mutate(
      { name: values.name, ...(values.uwi ? { uwi: values.uwi } : {}) },
      { onSuccess: () => reset() },
    );
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby={`${id}-title`}>
      <Flex direction="column" gap="3">
        <Heading as="h2" size="3" id={`${id}-title`}>
          New well
        </Heading>
        {createWell.error ? (
          <Callout.Root color="tomato" size="1" role="alert">
            <Callout.Text>{createWell.error.message}</Callout.Text>
          </Callout.Root>
        ) : null}
        {createWell.isSuccess ? (
          <Text size="1" color="jade" role="status">
            Well {createWell.data.name} created.
          </Text>
        ) : null}
        <Flex gap="3" wrap="wrap" align="end">
          <Flex direction="column" gap="1" flexGrow="1" minWidth="180px">
            <Text as="label" htmlFor={`${id}-name`} size="2" weight="medium">
              Well name
            </Text>
            <TextField.Root
              id={`${id}-name`}
              aria-invalid={errors.name ? true : undefined}
              aria-describedby={errors.name ? `${id}-name-error` : undefined}
              {...register('name')}
            />
          </Flex>
          <Flex direction="column" gap="1" flexGrow="1" minWidth="160px">
            <Text as="label" htmlFor={`${id}-uwi`} size="2" weight="medium">
              UWI (optional)
            </Text>
            <TextField.Root
              id={`${id}-uwi`}
              aria-invalid={errors.uwi ? true : undefined}
              aria-describedby={errors.uwi ? `${id}-uwi-error` : undefined}
              {...register('uwi')}
            />
          </Flex>
          <Button type="submit" loading={createWell.isPending}>
            Create well
          </Button>
        </Flex>
        {errors.name ? (
          <Text id={`${id}-name-error`} size="1" color="tomato">
            {errors.name.message}
          </Text>
        ) : null}
        {errors.uwi ? (
          <Text id={`${id}-uwi-error`} size="1" color="tomato">
            {errors.uwi.message}
          </Text>
        ) : null}
      </Flex>
    </form>
  );
}
