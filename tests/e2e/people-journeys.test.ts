import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { baseUrl, openPage, screenshot } from './support/browser';
import { inboxCount, nextLink, signInWithPicker } from './support/sign-in';

const ADMIN = 'esme.hartbridge@fernhollow.example';

/** Opens the admin's People page and searches it. */
async function searchPeople(page: Page, text: string): Promise<void> {
  await page.goto(`${baseUrl}/admin/people`);
  await page.getByLabel('Search', { exact: true }).fill(text);
}

describe('an admin brings people in', () => {
  it('invites a teacher, who signs in from the e-mails and lands on the teacher home', async () => {
    const invitee = 'nell.invited@fernhollow.example';
    const page = await openPage();
    await signInWithPicker(page, ADMIN);
    await page.goto(`${baseUrl}/admin/people/invite`);
    await page.getByLabel('E-mail address').fill(invitee);
    await page.getByLabel('Name').fill('Nell Invited');
    await page.getByRole('checkbox', { name: 'Teacher', exact: true }).check();
    const before = await inboxCount(invitee);
    await page.getByRole('button', { name: /Send invitation|Invite/ }).click();
    const { message, link } = await nextLink(invitee, before);
    expect(message.subject).toBe("You're invited to Fernhollow Academy (demo) on Pinfield");

    const person = await openPage({ width: 390, height: 844, mobile: true });
    await person.goto(link);
    expect(await person.getByLabel('School e-mail address').inputValue()).toBe(invitee);
    const beforeLink = await inboxCount(invitee);
    await person.getByRole('button', { name: 'E-mail me a sign-in link' }).click();
    const signIn = await nextLink(invitee, beforeLink);
    await person.goto(signIn.link);
    await person.getByRole('button', { name: 'Sign in to Pinfield' }).click();
    await person.waitForURL(`${baseUrl}/teacher`);
    await screenshot(person, 'invited-teacher-home-phone');

    await searchPeople(page, 'nell.invited');
    await page.getByRole('cell', { name: /^Nell Invited nell\.invited@fernhollow\.example/ }).waitFor();
  });

  it('imports a roster: a malformed row is reported and nothing saved until the file is fixed', async () => {
    const page = await openPage();
    await signInWithPicker(page, ADMIN);
    await page.goto(`${baseUrl}/admin/roster`);
    const bad = [
      'email,name,roles,class',
      'otto.roster@fernhollow.example,Otto Roster,student,10F Physics',
      'not-an-address,Bea Roster,student,',
    ].join('\n');
    await page.getByLabel('Or paste it here').fill(bad);
    await page.getByRole('button', { name: 'Check the roster' }).click();
    await page.getByText('Fix the roster before importing').waitFor();
    await page.getByText('Enter a valid e-mail address, like name@school.example.').waitFor();
    expect(await page.getByRole('button', { name: 'Import roster' }).isDisabled()).toBe(true);
    await screenshot(page, 'roster-preview-with-error');

    await searchPeople(page, 'otto.roster');
    await page.getByText('Nobody matches this search.').first().waitFor();

    await page.goto(`${baseUrl}/admin/roster`);
    await page.getByLabel('Or paste it here').fill(bad.replace('not-an-address', 'bea.roster@fernhollow.example'));
    await page.getByRole('button', { name: 'Check the roster' }).click();
    await page.getByText('Every row is ready').waitFor();
    await page.getByRole('button', { name: 'Import roster' }).click();
    await page.getByText('Roster imported').waitFor();
    expect(await page.getByText('2 people invited, 1 enrolment made.').count()).toBe(1);

    await searchPeople(page, 'roster@fernhollow');
    await page.getByRole('cell', { name: /^Otto Roster otto\.roster@fernhollow\.example/ }).waitFor();
    await page.getByRole('cell', { name: /^Bea Roster bea\.roster@fernhollow\.example/ }).waitFor();
  });
});

describe('students and roles', () => {
  it('a student joins a class with its code and lands in it', async () => {
    const student = 'pip.joiner@fernhollow.example';
    const page = await openPage({ width: 390, height: 844, mobile: true });
    await page.goto(`${baseUrl}/join`);
    await page.getByLabel('Class code').fill('tenfphys');
    await page.getByLabel('Your school e-mail address').fill(student);
    await page.getByLabel('Your name').fill('Pip Joiner');
    const before = await inboxCount(student);
    await page.getByRole('button', { name: 'Ask to join' }).click();
    await page.getByText('Request received').waitFor();
    const { message, link } = await nextLink(student, before);
    expect(message.subject).toBe('Join 10F Physics on Pinfield');
    await page.goto(link);
    await page.getByRole('button', { name: 'Sign in to Pinfield' }).click();
    await page.waitForURL(`${baseUrl}/student`);
    await page.getByText('10F Physics').first().waitFor();
    await screenshot(page, 'joined-student-home-phone');
  });

  it('a teacher who also coordinates switches to the coordinator view', async () => {
    const page = await openPage();
    await signInWithPicker(page, 'cora.vantwell@fernhollow.example');
    expect(new URL(page.url()).pathname).toBe('/teacher');
    await page.getByLabel('Acting as').selectOption({ label: 'Coordinator' });
    await page.waitForURL(`${baseUrl}/coordinator`);
    await page.getByRole('heading', { level: 1, name: 'Your department' }).waitFor();
    await page.reload();
    await page.getByRole('heading', { level: 1, name: 'Your department' }).waitFor();
    await screenshot(page, 'coordinator-after-switch');
  });
});
