/** The addresses scripts/test.ts hands to the e2e run; a missing one names how to get it. */
function required(name: string): string {
  const value = process.env[name];
  if (!value) {
    throw new Error(`${name} is not set. Run the browser tests through \`npm test\` (it starts the app, the fakes and chromium).`);
  }
  return value.replace(/\/+$/, '');
}

export const e2eEnv = {
  get baseUrl(): string {
    return required('E2E_BASE_URL');
  },
  get inboxUrl(): string {
    return required('E2E_INBOX_URL');
  },
  get oidcUrl(): string {
    return required('E2E_OIDC_URL');
  },
};

export function cdpPort(): number {
  const port = Number(process.env.E2E_CDP_PORT ?? '4326');
  if (!Number.isInteger(port) || port < 1 || port > 65535) {
    throw new Error(`E2E_CDP_PORT must be a port number, got "${process.env.E2E_CDP_PORT ?? ''}"`);
  }
  return port;
}
