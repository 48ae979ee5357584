import { describe, expect, it } from 'vitest';
import { defaultRole, type Role } from '../../core/roles';
import { demoAccounts, type DemoPerson } from '../../api/src/seed/demo-roster';
import { baseUrl, expectOnlyLoopback, openPage, screenshot } from './support/browser';
import { signInWithPicker as signIn } from './support/sign-in';

const SIZES = [
  { name: 'desktop', width: 1280, height: 800, mobile: false },
  { name: 'phone', width: 390, height: 844, mobile: true },
] as const;

const HOMES: Record<Role, { path: string; heading: (person: DemoPerson) => string }> = {
  teacher: { path: '/teacher', heading: (person) => `Welcome, ${person.name}` },
  student: { path: '/student', heading: (person) => `Hello, ${person.name}` },
  coordinator: { path: '/coordinator', heading: () => 'Your department' },
  substitute: { path: '/substitute', heading: () => 'Your cover' },
  admin: { path: '/admin/people', heading: () => 'People' },
};

function slug(text: string): string {
  return text
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '');
}

describe('signed-in shell: every demo account lands on its role’s home', () => {
  for (const person of demoAccounts) {
    for (const size of SIZES) {
      it(`${person.label} (${person.email}) at ${size.name} width`, async () => {
        const role = defaultRole(person.roles);
        expect(role, `${person.email} has a role`).toBeDefined();
        const home = HOMES[role!];
        const page = await openPage(size);
        await signIn(page, person.email);
        expect(new URL(page.url()).pathname).toBe(home.path);
        await page.getByRole('heading', { level: 1, name: home.heading(person) }).waitFor({ state: 'visible' });
        // The header names the school being worked in and offers sign-out.
        await page.getByRole('button', { name: 'Sign out' }).waitFor({ state: 'visible' });
        await page.waitForLoadState('networkidle');
        // Real data or an explaining empty state, and never an error banner.
        expect(await page.getByRole('alert').count()).toBe(0);
        expectOnlyLoopback(page);
        await screenshot(page, `home-${slug(person.name)}-${size.name}`);
      });
    }
  }
});

describe('admin pages', () => {
  const admin = demoAccounts.find((person) => person.roles.includes('admin'));
  const pages = [
    { path: '/admin/people', heading: 'People' },
    { path: '/admin/people/invite', heading: 'Invite a person' },
    { path: '/admin/roster', heading: 'Import a roster' },
    { path: '/admin/classes', heading: 'Classes' },
    { path: '/admin/departments', heading: 'Departments' },
    { path: '/admin/school', heading: 'School' },
  ];

  it('each admin page opens with its heading and no error, at both widths', async () => {
    expect(admin, 'the demo roster has an admin').toBeDefined();
    for (const size of SIZES) {
      const page = await openPage(size);
      await signIn(page, admin!.email);
      for (const target of pages) {
        await page.goto(`${baseUrl}${target.path}`, { waitUntil: 'load' });
        await page.getByRole('heading', { level: 1, name: target.heading, exact: true }).waitFor({ state: 'visible' });
        await page.waitForLoadState('networkidle');
        expect(await page.getByRole('alert').count(), `${target.path} shows no error`).toBe(0);
        await screenshot(page, `${slug(target.path)}-${size.name}`);
      }
      expectOnlyLoopback(page);
    }
  });

  it('a student opening an admin page is told it is not for their role', async () => {
    const student = demoAccounts.find((person) => person.roles.includes('student'));
    expect(student).toBeDefined();
    const page = await openPage({ width: 1280, height: 800 });
    await signIn(page, student!.email);
    await page.goto(`${baseUrl}/admin/people`, { waitUntil: 'load' });
    await page.getByRole('heading', { level: 1, name: 'Not available for your role' }).waitFor({ state: 'visible' });
    await screenshot(page, 'admin-as-student');
  });
});

describe('not-found page', () => {
  it('names the address that has no page', async () => {
    const page = await openPage({ width: 1280, height: 800 });
    await page.goto(`${baseUrl}/no/such/page`, { waitUntil: 'load' });
    await page.getByRole('heading', { level: 1, name: 'Page not found' }).waitFor({ state: 'visible' });
    expect(await page.getByText('/no/such/page').count()).toBe(1);
  });
});
