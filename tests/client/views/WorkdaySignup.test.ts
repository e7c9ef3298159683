import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent, { type UserEvent } from '@testing-library/user-event';
import { HttpResponse } from 'msw';
import { useClock } from '../support/clock';
import { errorResponse } from '../support/msw';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';
import { buildProfile, buildWorkday, mockWorkdayPage } from '../support/workdays';

useClock('2025-03-01T15:00:00Z');

const rosa = buildUser({ name: 'Rosa Mendes' });

async function openStepper(workday = buildWorkday()) {
  await renderApp(`/workdays/${workday.id}`, rosa);
  const main = within(screen.getByRole('main'));
  await main.findByRole('heading', { level: 3, name: 'Step 1 of 3: Role' });
  return main;
}

async function chooseRole(user: UserEvent, main: ReturnType<typeof within>, name: RegExp) {
  await user.click(main.getByRole('radio', { name }));
  await user.click(main.getByRole('button', { name: 'Next' }));
  await main.findByRole('heading', { level: 3, name: 'Step 2 of 3: About you' });
}

async function acceptWaiver(user: UserEvent, main: ReturnType<typeof within>, submit: string) {
  await main.findByRole('heading', { level: 3, name: 'Step 3 of 3: Waiver' });
  await user.click(await main.findByRole('checkbox', { name: 'I have read and accept the waiver' }));
  await user.type(main.getByLabelText('Your full name, typed as your signature'), 'Rosa Mendes');
  await user.click(main.getByRole('button', { name: submit }));
}

// Each test walks the whole stepper, typing as a person would: slower than most.
describe('the sign-up stepper', { timeout: 20_000 }, () => {
  it('signs up a kayak owner and posts the exact SignupBody, with the load converted from lb to kg', async () => {
    const workday = buildWorkday({ roles: [{ role: 'own-kayak', capacity: 3, confirmed: 1, waitlisted: 0 }, { role: 'planter', capacity: 6, confirmed: 3, waitlisted: 0 }] });
    const seen = mockWorkdayPage(workday, { signup: () => HttpResponse.json({ id: crypto.randomUUID(), status: 'confirmed', role: 'own-kayak' }, { status: 201 }) });
    const user = userEvent.setup();
    const main = await openStepper(workday);

    expect(main.getByRole('radio', { name: /Paddler with own kayak.*2 places left/ })).toBeTruthy();
    await chooseRole(user, main, /Paddler with own kayak/);
    // Prefilled from the profile.
    await waitFor(() => expect((main.getByLabelText('Date of birth') as HTMLInputElement).value).toBe('1990-04-02'));
    expect((main.getByLabelText("Emergency contact's name") as HTMLInputElement).value).toBe('Tomas Mendes');
    await user.click(main.getByRole('combobox', { name: 'Kind of craft' }));
    await user.click(await screen.findByRole('option', { name: 'Sit-on-top kayak' }));
    await user.type(main.getByLabelText('Maximum load (lb)'), '350');
    await user.click(main.getByRole('checkbox', { name: 'First aid certificate' }));
    await user.click(main.getByRole('button', { name: 'Next' }));

    expect(await main.findByRole('region', { name: 'Waiver text' })).toBeTruthy();
    expect(main.queryByRole('region', { name: "Guardian's waiver text" })).toBeNull();
    await acceptWaiver(user, main, 'Join the crew');

    await waitFor(() => expect(seen.posted).toHaveLength(1));
    expect(seen.posted[0]).toEqual({
      role: 'own-kayak',
      waiver: { accepted: true, signedName: 'Rosa Mendes', version: 3 },
      emergencyContact: { name: 'Tomas Mendes', phone: '+1 727 555 0142' },
      skills: ['paddler', 'first-aid'],
      dateOfBirth: '1990-04-02',
      // 350 lb × 0.45359237 kg/lb = 158.757 kg, kept to 0.1 kg.
      ownCraft: { kind: 'sit-on-top-kayak', seats: 1, maxLoadKg: 158.8 },
    });
    expect(await main.findByText("You're on the crew as paddler with own kayak.")).toBeTruthy();
    expect(main.getByRole('link', { name: 'My workdays' }).getAttribute('href')).toBe('/my/workdays');
    expect(main.getAllByRole('link', { name: 'Add to calendar' }).length).toBeGreaterThan(0);
  });

  it('asks an under-18 for a parent or guardian, checks the details, and sends them with the sign-up', async () => {
    const workday = buildWorkday({ minimumAge: 12 });
    // 14 on the day.
    const seen = mockWorkdayPage(workday, { profile: buildProfile({ dateOfBirth: '2010-06-01' }) });
    const user = userEvent.setup();
    const main = await openStepper(workday);

    await chooseRole(user, main, /Planter/);
    expect(await main.findByRole('group', { name: 'Parent or guardian' })).toBeTruthy();
    await user.click(main.getByRole('button', { name: 'Next' }));

    expect(main.getByRole('heading', { level: 3, name: 'Step 2 of 3: About you' })).toBeTruthy();
    expect(await main.findByText('Say how they are related to you, for example parent')).toBeTruthy();
    expect(await main.findByText('The guardian must type their full name')).toBeTruthy();
    await user.type(main.getByLabelText("Guardian's full name"), 'Marta Mendes');
    await user.type(main.getByLabelText('Relationship to you'), 'mother');
    await user.type(main.getByLabelText("Guardian's phone"), '+1 727 555 0199');
    await user.type(main.getByLabelText("Guardian's signature: their full name, typed by them"), 'Marta Mendes');
    await user.click(main.getByRole('button', { name: 'Next' }));

    expect(await main.findByRole('region', { name: "Guardian's waiver text" })).toBeTruthy();
    await acceptWaiver(user, main, 'Join the crew');

    await waitFor(() => expect(seen.posted).toHaveLength(1));
    expect(seen.posted[0]).toMatchObject({
      role: 'planter',
      dateOfBirth: '2010-06-01',
      guardian: { name: 'Marta Mendes', relationship: 'mother', phone: '+1 727 555 0199', signedName: 'Marta Mendes' },
    });
    expect((seen.posted[0] as { guardian: object }).guardian).not.toHaveProperty('email');
  });

  it('stops a volunteer under the minimum age with an explanation', async () => {
    const workday = buildWorkday({ minimumAge: 16 });
    mockWorkdayPage(workday, { profile: buildProfile({ dateOfBirth: '2010-06-01' }) });
    const user = userEvent.setup();
    const main = await openStepper(workday);

    await chooseRole(user, main, /Planter/);

    expect(await main.findByText('This workday is for ages 16 and up')).toBeTruthy();
    expect(main.getByRole('button', { name: 'Next' }).hasAttribute('disabled')).toBe(true);
  });

  it("puts the server's field errors back on the step that shows them", async () => {
    const workday = buildWorkday();
    const seen = mockWorkdayPage(workday, {
      signup: () => errorResponse(400, 'validation_failed', 'This workday is for ages 16 and up', { dateOfBirth: ['must be at least 16 years old on the day'] }),
    });
    const user = userEvent.setup();
    const main = await openStepper(workday);

    await chooseRole(user, main, /Planter/);
    await waitFor(() => expect((main.getByLabelText('Date of birth') as HTMLInputElement).value).toBe('1990-04-02'));
    await user.click(main.getByRole('button', { name: 'Next' }));
    await acceptWaiver(user, main, 'Join the crew');

    expect(await main.findByRole('heading', { level: 3, name: 'Step 2 of 3: About you' })).toBeTruthy();
    expect(await main.findByText('Must be at least 16 years old on the day')).toBeTruthy();
    expect(seen.posted).toHaveLength(1);
  });

  it('sends a role error back to the first step', async () => {
    const workday = buildWorkday();
    mockWorkdayPage(workday, { signup: () => errorResponse(400, 'validation_failed', 'Not needed', { role: ['is not offered on this workday'] }) });
    const user = userEvent.setup();
    const main = await openStepper(workday);

    await chooseRole(user, main, /Planter/);
    await waitFor(() => expect((main.getByLabelText('Date of birth') as HTMLInputElement).value).toBe('1990-04-02'));
    await user.click(main.getByRole('button', { name: 'Next' }));
    await acceptWaiver(user, main, 'Join the crew');

    expect(await main.findByRole('heading', { level: 3, name: 'Step 1 of 3: Role' })).toBeTruthy();
    expect(main.getByText('Is not offered on this workday')).toBeTruthy();
  });

  it('joins the waitlist of a full role and shows the place in line', async () => {
    const workday = buildWorkday();
    const seen = mockWorkdayPage(workday, { signup: () => HttpResponse.json({ id: crypto.randomUUID(), status: 'waitlisted', role: 'own-kayak', position: 2 }, { status: 201 }) });
    const user = userEvent.setup();
    const main = await openStepper(workday);

    expect(main.getByRole('radio', { name: /Paddler with own kayak.*Full: you'll join the waitlist \(1 waiting\)/ })).toBeTruthy();
    await chooseRole(user, main, /Paddler with own kayak/);
    await user.click(main.getByRole('combobox', { name: 'Kind of craft' }));
    await user.click(await screen.findByRole('option', { name: 'Canoe' }));
    await user.clear(main.getByLabelText('Seats'));
    await user.type(main.getByLabelText('Seats'), '2');
    await user.type(main.getByLabelText('Maximum load (lb)'), '600');
    await user.click(main.getByRole('button', { name: 'Next' }));
    await acceptWaiver(user, main, 'Join the waitlist');

    expect(await main.findByText("You're number 2 on the waitlist for paddler with own kayak.")).toBeTruthy();
    expect(seen.posted[0]).toMatchObject({ ownCraft: { kind: 'canoe', seats: 2, maxLoadKg: 272.2 } });
  });
});
