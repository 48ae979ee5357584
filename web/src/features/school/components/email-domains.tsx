import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { SchoolUpdateSchema, type SchoolDto } from '@core/contracts';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ErrorBanner } from '@/components/ui/error-banner';
import { Field } from '@/components/ui/field';
import { CloseIcon, PlusIcon } from '@/components/ui/icons';
import { Input } from '@/components/ui/input';
import { LiveRegion } from '@/components/ui/live-region';
import { isApiError } from '@/lib/api-client';
import { useUpdateSchool } from '../api/update-school';

// One domain, validated by the same rule the API applies to each entry of emailDomains.
const AddDomainSchema = z.object({ domain: SchoolUpdateSchema.shape.emailDomains.unwrap().element });
type FormInput = z.input<typeof AddDomainSchema>;
type FormOutput = z.output<typeof AddDomainSchema>;

/** The e-mail domains whose students may join a class by its code. Each change is saved at once. */
export function EmailDomains({ school }: { school: SchoolDto }) {
  const mutation = useUpdateSchool();
  const [saved, setSaved] = useState<string | null>(null);
  const form = useForm<FormInput, unknown, FormOutput>({ resolver: zodResolver(AddDomainSchema), defaultValues: { domain: '' } });

  async function save(emailDomains: string[], message: string): Promise<boolean> {
    setSaved(null);
    try {
      await mutation.mutateAsync({ emailDomains });
      setSaved(message);
      return true;
    } catch (error) {
      // A detail for the new (last) entry belongs next to the input; anything else shows in the banner.
      const detail = isApiError(error) ? error.details.find((item) => item.path === `emailDomains.${emailDomains.length - 1}`) : undefined;
      if (detail) form.setError('domain', { type: 'server', message: detail.message });
      return false;
    }
  }

  const onAdd = form.handleSubmit(async ({ domain }) => {
    if (school.emailDomains.includes(domain)) {
      form.setError('domain', { type: 'duplicate', message: `${domain} is already on the list.` });
      return;
    }
    if (await save([...school.emailDomains, domain], `${domain} added.`)) form.reset();
  });

  return (
    <div className="flex flex-col gap-4">
      {school.emailDomains.length === 0 ? (
        <p className="text-ink-muted">
          No domains yet: nobody can join a class by code until you add the domain of your school’s e-mail addresses.
        </p>
      ) : (
        <ul className="flex flex-col divide-y divide-line rounded-md border border-line bg-surface">
          {school.emailDomains.map((domain) => (
            <li key={domain} className="flex items-center justify-between gap-3 px-4 py-2">
              <span className="font-mono break-all">@{domain}</span>
              <Button
                variant="danger"
                size="sm"
                disabled={mutation.isPending}
                aria-label={`Remove ${domain}`}
                onClick={() =>
                  void save(
                    school.emailDomains.filter((item) => item !== domain),
                    `${domain} removed.`,
                  )
                }
              >
                <CloseIcon className="size-4" />
                Remove
              </Button>
            </li>
          ))}
        </ul>
      )}
      <form onSubmit={(event) => void onAdd(event)} noValidate className="flex flex-col gap-3 sm:flex-row sm:items-start">
        <Field
          label="Add a domain"
          hint="Like school.example, without @ or https://."
          error={form.formState.errors.domain?.message}
          className="flex-1"
        >
          {(control) => <Input {...control} {...form.register('domain')} mono autoComplete="off" spellCheck={false} />}
        </Field>
        <Button type="submit" busy={mutation.isPending} className="sm:mt-[3.25rem]">
          <PlusIcon className="size-5" />
          Add domain
        </Button>
      </form>
      <LiveRegion>{saved ? <Banner tone="success">{saved}</Banner> : null}</LiveRegion>
      {mutation.isError && !form.formState.errors.domain ? <ErrorBanner error={mutation.error} title="The domains were not saved" /> : null}
    </div>
  );
}
