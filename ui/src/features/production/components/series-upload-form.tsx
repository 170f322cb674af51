import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Callout, Flex, SegmentedControl, Text, TextArea } from '@radix-ui/themes';
import { useId, useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { ApiError } from '../../../lib/api-client';
import { csvProblems, useUploadSeries } from '../api/upload-series';

const schema = z
  .object({
    kind: z.enum(['pressure', 'rate']),
    fluid: z.enum(['gas', 'oil']),
    cumGasUnit: z.enum(['scf', 'Mscf', 'MMscf', 'Bcf', 'm3']),
    pressureUnit: z.enum(['psia', 'kPa', 'bar']),
    timeUnit: z.enum(['day', 'month', 'year']),
    rateUnit: z.enum(['STB/d', 'Mscf/d', 'MMscf/d', 'm3/d']),
    label: z.string().max(120, { error: 'A label is at most 120 characters.' }),
    text: z.string(),
  })
  .refine((v) => v.kind === 'rate' || v.fluid === 'gas', { path: ['fluid'], error: 'p/z needs gas: static pressure against cumulative gas.' });
type Values = z.infer<typeof schema>;

const EXAMPLES = {
  pressure: 'cum_gas,pressure\n0,3000\n500,2810\n1000,2620',
  rate: 't,rate\n0,1000\n1,960\n2,921',
} as const;

/**
 * Adds production data to a well: pressure against cumulative gas (for p/z) or rate against
 * time (for decline), from a CSV file or typed in as CSV. A refused file lists every bad line.
 */
export function SeriesUploadForm({ assetId, wellId, wellName, onStored }: { assetId: string; wellId: string; wellName: string; onStored?: (seriesId: string) => void }) {
  const id = useId();
  const upload = useUploadSeries(assetId, wellId);
  const [source, setSource] = useState<'file' | 'text'>('file');
  const [file, setFile] = useState<File | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  const { register, handleSubmit, watch, formState: { errors } } = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: { kind: 'pressure', fluid: 'gas', cumGasUnit: 'MMscf', pressureUnit: 'psia', timeUnit: 'month', rateUnit: 'Mscf/d', label: '', text: '' },
  });
  const kind = watch('kind');
  const submit = handleSubmit((v) => {
    let blob: Blob;
    let fileName: string;
    if (source === 'file') {
      if (!file) {
        setFileError('Choose a CSV file.');
        return;
      }
      blob = file;
      fileName = file.name;
    } else {
      if (!v.text.trim()) {
        setFileError('Type or paste the points as CSV, with a header row.');
        return;
      }
      blob = new Blob([v.text], { type: 'text/csv' });
      fileName = `${wellName}-${v.kind}-entered.csv`;
    }
    setFileError(null);
    const units = v.kind === 'pressure' ? { cumGasUnit: v.cumGasUnit, pressureUnit: v.pressureUnit } : { timeUnit: v.timeUnit, rateUnit: v.rateUnit };
    upload.mutate(
      { kind: v.kind, fluid: v.fluid, file: blob, fileName, units, label: v.label.trim() || (source === 'text' ? `${v.kind === 'pressure' ? 'Pressures' : 'Rates'} entered` : undefined) },
      { onSuccess: (s) => onStored?.(s.id) },
    );
  });
  const problems = upload.error instanceof ApiError ? csvProblems(upload.error.body) : [];
  return (
    <form onSubmit={submit} noValidate aria-label={`Add production data to ${wellName}`}>
      <Flex direction="column" gap="3" className="rc-fieldset">
        <Flex gap="3" wrap="wrap" align="end">
          <Flex direction="column" gap="1">
            <Text as="label" size="2" weight="medium" htmlFor={`${id}-kind`}>
              Kind of data
            </Text>
            <select id={`${id}-kind`} className="native-select" {...register('kind')}>
              <option value="pressure">Static pressure vs cumulative gas</option>
              <option value="rate">Rate vs time</option>
            </select>
          </Flex>
          <Flex direction="column" gap="1">
            <Text as="label" size="2" weight="medium" htmlFor={`${id}-fluid`}>
              Fluid
            </Text>
            <select id={`${id}-fluid`} className="native-select" {...register('fluid')}>
              <option value="gas">Gas</option>
              <option value="oil">Oil</option>
            </select>
          </Flex>
          {kind === 'pressure' ? (
            <>
              <Flex direction="column" gap="1">
                <Text as="label" size="2" weight="medium" htmlFor={`${id}-gu`}>
                  Cumulative gas unit
                </Text>
                <select id={`${id}-gu`} className="native-select" {...register('cumGasUnit')}>
                  {['scf', 'Mscf', 'MMscf', 'Bcf', 'm3'].map((u) => (
                    <option key={u}>{u}</option>
                  ))}
                </select>
              </Flex>
              <Flex direction="column" gap="1">
                <Text as="label" size="2" weight="medium" htmlFor={`${id}-pu`}>
                  Pressure unit (absolute)
                </Text>
                <select id={`${id}-pu`} className="native-select" {...register('pressureUnit')}>
                  {['psia', 'kPa', 'bar'].map((u) => (
                    <option key={u}>{u}</option>
                  ))}
                </select>
              </Flex>
            </>
          ) : (
            <>
              <Flex direction="column" gap="1">
                <Text as="label" size="2" weight="medium" htmlFor={`${id}-tu`}>
                  Time unit (numeric t)
                </Text>
                <select id={`${id}-tu`} className="native-select" {...register('timeUnit')}>
                  {['day', 'month', 'year'].map((u) => (
                    <option key={u}>{u}</option>
                  ))}
                </select>
              </Flex>
              <Flex direction="column" gap="1">
                <Text as="label" size="2" weight="medium" htmlFor={`${id}-ru`}>
                  Rate unit
                </Text>
                <select id={`${id}-ru`} className="native-select" {...register('rateUnit')}>
                  {['STB/d', 'Mscf/d', 'MMscf/d', 'm3/d'].map((u) => (
                    <option key={u}>{u}</option>
                  ))}
                </select>
              </Flex>
            </>
          )}
          <Flex direction="column" gap="1">
            <Text as="label" size="2" weight="medium" htmlFor={`${id}-label`}>
              Label (optional)
            </Text>
            <input id={`${id}-label`} className="number-input" style={{ width: 180 }} {...register('label')} />
          </Flex>
        </Flex>
        {errors.fluid ? (
          <Text size="1" color="tomato">
            {errors.fluid.message}
          </Text>
        ) : null}
        <SegmentedControl.Root value={source} onValueChange={(s) => setSource(s as 'file' | 'text')} size="1" aria-label="Data source">
          <SegmentedControl.Item value="file">Upload CSV</SegmentedControl.Item>
          <SegmentedControl.Item value="text">Enter points</SegmentedControl.Item>
        </SegmentedControl.Root>
        {source === 'file' ? (
          <input type="file" accept=".csv,text/csv,text/plain" aria-label="CSV file" onChange={(e) => setFile(e.currentTarget.files?.[0] ?? null)} />
        ) : (
          <TextArea aria-label="Points as CSV" rows={6} placeholder={EXAMPLES[kind]} className="mono" {...register('text')} />
        )}
        <Text size="1" color="gray">
          {kind === 'pressure'
            ? 'Header row with columns cum_gas (or gp) and pressure (or p); one static (average) reservoir pressure per line.'
            : 'Header row with columns t (numeric, in the time unit) or date (yyyy-mm-dd), and rate (or q).'}
        </Text>
        {fileError ? (
          <Text size="1" color="tomato" role="alert">
            {fileError}
          </Text>
        ) : null}
        {upload.error ? (
          <Callout.Root color="tomato" size="1" role="alert">
            <Callout.Text>Nothing was stored. {problems.length ? '' : upload.error.message}</Callout.Text>
            {problems.length ? (
              <ul className="rc-problems">
                {problems.map((p, i) => (
                  <li key={i}>
                    <Text size="1">{p.line ? `Line ${p.line}: ` : ''}{p.message}</Text>
                  </li>
                ))}
              </ul>
            ) : null}
          </Callout.Root>
        ) : null}
        {upload.isSuccess ? (
          <Text size="1" color="jade" role="status">
            Stored “{upload.data.label}” ({upload.data.points.length} points).
          </Text>
        ) : null}
        <Flex>
          <Button type="submit" loading={upload.isPending}>
            Add data
          </Button>
        </Flex>
      </Flex>
    </form>
  );
}
