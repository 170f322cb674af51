import { zodResolver } from '@hookform/resolvers/zod';
import { Badge, Button, Callout, Flex, Heading, Table, Text, TextField } from '@radix-ui/themes';
import { useId } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { PageSpinner } from '../../../components/page-spinner';
import { ROLES } from '../../../types/admin';
import type { Role } from '../../../types/api';
import { useMembers } from '../api/get-members';
import { usePutMember } from '../api/put-member';
import { useRemoveMember } from '../api/remove-member';

const addMemberSchema = z.object({
  email: z.email({ error: 'Enter the e-mail of an account of your organisation.' }),
  role: z.enum(['admin', 'petrophysicist', 'engineer', 'reviewer', 'viewer'], { error: 'Choose a role.' }),
});

type AddMemberValues = z.infer<typeof addMemberSchema>;

export interface MembersPanelProps {
  assetId: string;
  assetName: string;
  /** E-mails of the organisation's accounts, offered while typing. */
  knownEmails?: string[];
}

/** Who holds which role in one asset: add a member by e-mail, change a role, remove a member. */
export function MembersPanel({ assetId, assetName, knownEmails = [] }: MembersPanelProps) {
  const id = useId();
  const members = useMembers(assetId);
  const put = usePutMember(assetId);
  const remove = useRemoveMember(assetId);
  const {
    register,
    handleSubmit,
    reset,
    formState: { errors },
  } = useForm<AddMemberValues>({ resolver: zodResolver(addMemberSchema), defaultValues: { email: '', role: 'viewer' } });

  const onAdd = handleSubmit((values) => {
    remove.reset();
    put.mutate(values, { onSuccess: () => reset({ email: '', role: values.role }) });
  });
  const changeRole = (email: string, role: Role) => {
    remove.reset();
    put.mutate({ email, role });
  };
  const error = put.error ?? remove.error;

  return (
    <section aria-labelledby={`${id}-title`}>
      <Flex direction="column" gap="3">
        <Heading as="h3" size="4" id={`${id}-title`}>
          Members of {assetName}
        </Heading>
        <Text size="2" color="gray">
          Roles are held per asset. Organisation admins see every asset as admin, listed here or not.
        </Text>
        {error ? (
          <Callout.Root color="tomato" size="1" role="alert">
            <Callout.Text>{error.message}</Callout.Text>
          </Callout.Root>
        ) : null}
        {members.isPending ? (
          <PageSpinner label="Loading members…" />
        ) : members.isError ? (
          <Callout.Root color="tomato" role="alert">
            <Callout.Text>Members could not be loaded: {members.error.message}</Callout.Text>
          </Callout.Root>
        ) : (
          <Table.Root variant="surface" size="1">
            <caption className="visually-hidden">{`Members of ${assetName}`}</caption>
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeaderCell>Name</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>E-mail</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Role</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>
                  <span className="visually-hidden">Remove</span>
                </Table.ColumnHeaderCell>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {members.data.length === 0 ? (
                <Table.Row>
                  <Table.Cell colSpan={4}>
                    <Text color="gray">No members yet.</Text>
                  </Table.Cell>
                </Table.Row>
              ) : (
                members.data.map((m) => (
                  <Table.Row key={m.userId}>
                    <Table.Cell>
                      <Flex gap="2" align="center">
                        {m.name}
                        {m.isAdmin ? (
                          <Badge size="1" variant="soft" color="jade" title="Organisation admin">
                            org admin
                          </Badge>
                        ) : null}
                      </Flex>
                    </Table.Cell>
                    <Table.Cell>
                      <span className="mono">{m.email}</span>
                    </Table.Cell>
                    <Table.Cell>
                      <select
                        className="native-select"
                        aria-label={`Role of ${m.name}`}
                        value={m.role}
                        disabled={put.isPending}
                        onChange={(e) => changeRole(m.email, e.currentTarget.value as Role)}
                      >
                        {ROLES.map((r) => (
                          <option key={r} value={r}>
                            {r}
                          </option>
                        ))}
                      </select>
                    </Table.Cell>
                    <Table.Cell>
                      <Button
                        size="1"
                        variant="soft"
                        color="tomato"
                        aria-label={`Remove ${m.name} from ${assetName}`}
                        disabled={remove.isPending}
                        onClick={() => {
                          put.reset();
                          remove.mutate(m.userId);
                        }}
                      >
                        Remove
                      </Button>
                    </Table.Cell>
                  </Table.Row>
                ))
              )}
            </Table.Body>
          </Table.Root>
        )}
        <form onSubmit={onAdd} noValidate aria-label={`Add a member to ${assetName}`}>
          <Flex gap="3" wrap="wrap" align="end">
            <Flex direction="column" gap="1" flexGrow="1" minWidth="220px">
              <Text as="label" htmlFor={`${id}-email`} size="2" weight="medium">
                E-mail of the person
              </Text>
              <TextField.Root
                id={`${id}-email`}
                type="email"
                list={`${id}-emails`}
                autoComplete="off"
                aria-invalid={errors.email ? true : undefined}
                aria-describedby={errors.email ? `${id}-email-error` : undefined}
                {...register('email')}
              />
              <datalist id={`${id}-emails`}>
                {knownEmails.map((e) => (
                  <option key={e} value={e} />
                ))}
              </datalist>
            </Flex>
            <Flex direction="column" gap="1">
              <Text as="label" htmlFor={`${id}-role`} size="2" weight="medium">
                Role
              </Text>
              <select id={`${id}-role`} className="native-select" {...register('role')}>
                {ROLES.map((r) => (
                  <option key={r} value={r}>
                    {r}
                  </option>
                ))}
              </select>
            </Flex>
            <Button type="submit" loading={put.isPending}>
              Add member
            </Button>
          </Flex>
          {errors.email ? (
            <Text id={`${id}-email-error`} size="1" color="tomato">
              {errors.email.message}
            </Text>
          ) : null}
        </form>
      </Flex>
    </section>
  );
}
