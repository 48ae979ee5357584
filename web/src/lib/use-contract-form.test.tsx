import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { StudentJoinSchema } from '@core/contracts';
import { ApiError } from './api-client';
import { useContractForm } from './use-contract-form';

type Submit = (values: { code: string }) => Promise<unknown>;

// A bare form around the hook, so each test sees exactly what the hook puts on the page.
function CodeForm({ submit, resetOnSuccess }: { submit: Submit; resetOnSuccess?: boolean }) {
  const { form, onSubmit, banner } = useContractForm({
    schema: StudentJoinSchema,
    defaultValues: { code: '' },
    serverFields: ['code'],
    fallbackField: 'code',
    submit,
    resetOnSuccess,
  });
  return (
    <form onSubmit={onSubmit} noValidate>
      <label htmlFor="code">Code</label>
      <input id="code" {...form.register('code')} />
      <p data-testid="field-error">{form.formState.errors.code?.message ?? ''}</p>
      <p data-testid="banner">{banner ?? ''}</p>
      <p data-testid="state">{form.formState.isSubmitSuccessful ? 'sent' : ''}</p>
      <button type="submit">Send</button>
    </form>
  );
}

async function send(submit: Submit, code: string, resetOnSuccess?: boolean) {
  const user = userEvent.setup();
  render(<CodeForm submit={submit} resetOnSuccess={resetOnSuccess} />);
  await user.type(screen.getByLabelText('Code'), code);
  await user.click(screen.getByRole('button', { name: 'Send' }));
}

describe('useContractForm', () => {
  it('submits the parsed values and empties the form when asked to', async () => {
    const submit = vi.fn<Submit>().mockResolvedValue(undefined);
    await send(submit, ' qw3rty9p ', true);
    await waitFor(() => expect(screen.getByLabelText('Code')).toHaveValue(''));
    expect(submit).toHaveBeenCalledWith({ code: 'QW3RTY9P' });
    expect(screen.getByTestId('banner')).toHaveTextContent('');
  });

  it('keeps the values after success without resetOnSuccess', async () => {
    await send(vi.fn<Submit>().mockResolvedValue(undefined), 'QW3RTY9P');
    expect(await screen.findByText('sent')).toBeInTheDocument();
    expect(screen.getByLabelText('Code')).toHaveValue('QW3RTY9P');
  });

  it('does not submit what the contract rejects, and shows the contract message on the field', async () => {
    const submit = vi.fn<Submit>();
    await send(submit, 'short');
    expect(await screen.findByText('A class code has 8 letters and digits, like K7QM2XPA.')).toHaveAttribute('data-testid', 'field-error');
    expect(submit).not.toHaveBeenCalled();
  });

  it('puts an error without details on the fallback field, not in the banner', async () => {
    await send(vi.fn<Submit>().mockRejectedValue(new ApiError(404, 'class_not_found', 'No class has that code.')), 'QW3RTY9P');
    expect(await screen.findByText('No class has that code.')).toHaveAttribute('data-testid', 'field-error');
    expect(screen.getByTestId('banner')).toHaveTextContent('');
    expect(screen.getByLabelText('Code')).toHaveValue('QW3RTY9P');
  });

  it('shows a failure no field can take in the banner', async () => {
    await send(vi.fn<Submit>().mockRejectedValue(new TypeError('Failed to fetch')), 'QW3RTY9P');
    expect(await screen.findByText('Something went wrong while sending the form. Try again.')).toHaveAttribute('data-testid', 'banner');
    expect(screen.getByTestId('field-error')).toHaveTextContent('');
  });
});
