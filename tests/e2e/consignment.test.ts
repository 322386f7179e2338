import { expectAccessible, newPage, problemsOf, screenshot } from './helpers/browser';
import { consignmentOf, receivedMail, waitFor } from './helpers/consignments';
import { withServerAndBrowser } from './helpers/setup';
import { fillSignIn, makeImage, signInToStudio } from './helpers/studio';

const env = withServerAndBrowser();

const venueName = 'Deepwinter Makers Fair';
const venueEmail = 'stands@deepwinter.example';

describe('sending a batch to a show', () => {
  let consignmentId: number;
  let inviteUrl: string;
  let changedLineId: number;

  it('the owner makes a consignment of five, checks them (one chipped, with a photo) and sends it (phone)', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url);
    await page.getByTestId('nav-consignments').click();
    await page.getByTestId('consignments-screen').waitFor();
    await screenshot(page, 'consignments-phone');
    await expectAccessible(page);

    await page.getByTestId('consignments-new').click();
    await page.getByTestId('consignment-create-screen').waitFor();
    await page.getByTestId('consignment-venueId').selectOption({ label: venueName });
    await page.getByTestId('consignment-title').fill('Midwinter table');
    await page.getByTestId('consignment-dispatchDate').fill('2026-12-07');
    await page.getByTestId('consignment-openingDate').fill('2026-12-12');
    await page.getByTestId('consignment-closingDate').fill('2026-12-20');
    await page.getByTestId('consignment-returnDueDate').fill('2027-01-10');
    await screenshot(page, 'consignment-new-phone');
    await expectAccessible(page);
    await page.getByTestId('consignment-submit').click();
    await page.getByTestId('consignment-screen').waitFor();
    consignmentId = Number(new URL(page.url()).pathname.split('/').at(-1));
    expect((await consignmentOf(page, consignmentId)).state).toBe('draft');

    // Five works still in the studio, each added with its retail price as the list price.
    await page.getByTestId('consignment-add-works').click();
    for (let added = 1; added <= 5; added += 1) {
      await page.locator('[data-testid^="pick-"][data-testid$="-add"]').first().click();
      await page
        .getByTestId('consignment-money-pieces')
        .getByText(String(added), { exact: true })
        .waitFor();
    }
    await screenshot(page, 'consignment-picker-phone');
    await page.getByTestId('pick-done').click();
    const draft = await consignmentOf(page, consignmentId);
    expect(draft.lines).toHaveLength(5);
    for (const line of draft.lines) {
      const work = await (
        await page.request.get(`${env.server.url}/api/works/${line.workId}`)
      ).json();
      expect(line.listPrice).toEqual(work.retailPrice);
    }

    await page.getByTestId('consignment-agree').click();
    await page.getByTestId('consignment-dispatch').waitFor();

    // The first piece has a chip on its rim, photographed; the rest have no faults.
    const chipped = draft.lines[0]!;
    const form = `piece-${chipped.id}-check-form`;
    await page.getByTestId(`piece-${chipped.id}-check-record`).click();
    await page.getByTestId(`${form}-add-finding`).click();
    await page.getByTestId(`${form}-finding-kind`).selectOption('chip');
    await page.getByTestId(`${form}-finding-grade-slight`).click();
    await page.getByTestId(`${form}-finding-location`).fill('rim, at the handle');
    await page.getByTestId(`${form}-finding-size`).fill('3');
    const [chooser] = await Promise.all([
      page.waitForEvent('filechooser'),
      page.getByTestId(`${form}-finding-photo`).click(),
    ]);
    await chooser.setFiles({
      name: 'rim-chip.jpg',
      mimeType: 'image/jpeg',
      buffer: await makeImage('jpeg', [120, 96, 70]),
    });
    await page.getByTestId(`${form}-finding-photo`).getByText('Change the photo').waitFor();
    await screenshot(page, 'consignment-finding-phone');
    await expectAccessible(page);
    await page.getByTestId(`${form}-finding-add`).click();
    await page.getByTestId(`${form}-submit`).click();
    await page.getByTestId(`piece-${chipped.id}-check-dispatch`).waitFor();

    // Sending before the rest are checked is refused, naming them.
    await page.getByTestId('consignment-dispatch').click();
    await expect(page.getByTestId('consignment-step-error').innerText()).resolves.toMatch(
      /Not yet checked: .*;.*;.*;/,
    );
    // The refusal is the 409 the browser logs; nothing else may be.
    expect(problemsOf(page)).toEqual([
      'Failed to load resource: the server responded with a status of 409 (Conflict)',
    ]);
    problemsOf(page).length = 0;
    await page.getByTestId('consignment-all-sound').click();
    await waitFor(async () => {
      const c = await consignmentOf(page, consignmentId);
      return c.lines.every((l) => l.dispatchCheck) ? c : undefined;
    }, 'every dispatch check');
    const checked = await consignmentOf(page, consignmentId);
    const chip = checked.lines[0]!.dispatchCheck!;
    expect(chip.overallGrade).toBe('slight');
    expect(chip.findings[0]).toMatchObject({
      kind: 'chip',
      location: 'rim, at the handle',
      sizeMm: 3,
    });
    expect(chip.findings[0]!.photoUrl).toMatch(/^\/api\/condition-photos\/\d+$/);
    expect(checked.lines.slice(1).every((l) => l.dispatchCheck!.overallGrade === 'sound')).toBe(
      true,
    );

    await page.getByTestId('consignment-dispatch').click();
    await page
      .getByTestId('step-send-summary')
      .filter({ hasText: `mailed to ${venueEmail}` })
      .waitFor();
    expect((await consignmentOf(page, consignmentId)).state).toBe('dispatched');
    await screenshot(page, 'consignment-sent-phone');
    await expectAccessible(page);

    // The dispatch e-mail on the Sent mail page, gone through the local stand-in.
    // On a phone Sent mail is under More, with Settings.
    await page.getByTestId('nav-more').click();
    await page.getByTestId('more-screen').waitFor();
    await screenshot(page, 'more-phone');
    await expectAccessible(page);
    await page.getByTestId('more-mail').click();
    await page.getByTestId('mail-screen').waitFor();
    const card = page.locator('[data-testid^="mail-card-"]', { hasText: 'Midwinter table' });
    await card.getByText('Sent', { exact: true }).waitFor({ timeout: 20_000 });
    await screenshot(page, 'consignment-mail-phone');
    await card.click();
    await page.getByTestId('message-screen').waitFor();
    await expect(page.getByTestId('message-screen').innerText()).resolves.toMatch(
      /consignment sheet\.pdf[\s\S]*condition report\.pdf[\s\S]*labels\.pdf/,
    );
    await screenshot(page, 'consignment-mail-message-phone');

    const mail = (await receivedMail(env.server.dataDir)).find((m) =>
      m.subject?.includes('Midwinter table'),
    );
    expect(mail).toBeDefined();
    expect(mail!.to).toMatchObject({ text: venueEmail });
    expect(mail!.attachments.map((a) => a.contentType)).toEqual([
      'application/pdf',
      'application/pdf',
      'application/pdf',
    ]);
    for (const attachment of mail!.attachments) {
      expect(attachment.content.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    }
    inviteUrl = /http:\/\/localhost:\d+\/invite\/[A-Za-z0-9_-]+/.exec(mail!.text ?? '')![0];
    expect(problemsOf(page)).toEqual([]);
  });

  it('the invited venue member sets a password and acknowledges arrival with one new finding (phone)', async () => {
    const page = await newPage(env.browser, 'phone');
    await page.goto(inviteUrl);
    await page.getByTestId('invitation-screen').waitFor();
    await expect(page.getByTestId('invitation-screen').innerText()).resolves.toContain(venueName);
    await page.getByTestId('invite-name').fill('Rowan Achterberg');
    await page.getByTestId('invite-password').fill('a long fair password for the stand');
    await screenshot(page, 'invitation-phone');
    await expectAccessible(page);
    await page.getByTestId('invite-submit').click();
    await page.getByTestId('venue-home-screen').waitFor();
    await page.getByText('Midwinter table').first().click();
    await page.getByTestId('venue-consignment-screen').waitFor();
    await page.getByTestId('acknowledge').waitFor();
    await screenshot(page, 'venue-acknowledge-phone');
    await expectAccessible(page);

    // A hairline crack on the second piece that was not there at dispatch.
    const c = await consignmentOf(page, consignmentId);
    changedLineId = c.lines[1]!.id;
    const form = `arrival-${changedLineId}-form`;
    await page.getByTestId(`arrival-${changedLineId}-differs`).click();
    await page.getByTestId(`${form}-add-finding`).click();
    await page.getByTestId(`${form}-finding-kind`).selectOption('hairline-crack');
    await page.getByTestId(`${form}-finding-grade-marked`).click();
    await page.getByTestId(`${form}-finding-location`).fill('foot ring');
    await page.getByTestId(`${form}-finding-size`).fill('12');
    await page.getByTestId(`${form}-finding-add`).click();
    await page.getByTestId(`${form}-submit`).click();
    await page.getByTestId(`arrival-${changedLineId}-changed`).waitFor();
    await screenshot(page, 'venue-acknowledge-changed-phone');

    await page.getByTestId('acknowledge-submit').click();
    await page.getByTestId('venue-acknowledged').waitFor();
    await expect(page.getByTestId('venue-acknowledged').innerText()).resolves.toContain(
      'Rowan Achterberg',
    );
    const after = await consignmentOf(page, consignmentId);
    expect(after.state).toBe('on-show');
    // Every piece has its arrival check; the chipped one starts from its dispatch finding.
    expect(after.lines.every((l) => l.arrivalCheck)).toBe(true);
    expect(after.lines[0]!.arrivalCheck!.findings.map((f) => f.kind)).toEqual(['chip']);
    await screenshot(page, 'venue-acknowledged-phone');
    await expectAccessible(page);
    expect(problemsOf(page)).toEqual([]);
  });

  it('the owner sees the acknowledgment and the new damage flagged (phone)', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url);
    await page.goto(`${env.server.url}/consignments/${consignmentId}`);
    await page.getByTestId('consignment-screen').waitFor();
    await expect(page.getByTestId('step-arrived-summary').innerText()).resolves.toMatch(
      /Acknowledged by Rowan Achterberg on .*Some pieces differ from dispatch/,
    );
    const differences = page.getByTestId(`piece-${changedLineId}-check-differences`);
    await expect(differences.innerText()).resolves.toMatch(
      /New since dispatch: Hairline crack, marked, foot ring, 12 mm/,
    );
    await differences.scrollIntoViewIfNeeded();
    await screenshot(page, 'consignment-difference-phone');
    await expectAccessible(page);
    expect(problemsOf(page)).toEqual([]);
  });

  it('shows the consignments table, the consignment and the venue’s page wide', async () => {
    const page = await newPage(env.browser, 'wide');
    await signInToStudio(page, env.server.url);
    await page.getByTestId('nav-consignments').click();
    await page.getByTestId(`consignment-link-${consignmentId}`).waitFor();
    await screenshot(page, 'consignments-wide');
    await expectAccessible(page);
    await page.getByTestId(`consignment-link-${consignmentId}`).click();
    await page.getByTestId('consignment-screen').waitFor();
    await page.getByTestId(`piece-${changedLineId}-check-differences`).waitFor();
    await screenshot(page, 'consignment-wide');
    await expectAccessible(page);
    expect(problemsOf(page)).toEqual([]);

    const venue = await newPage(env.browser, 'wide');
    await venue.goto(`${env.server.url}/sign-in`);
    await fillSignIn(venue, venueEmail, 'a long fair password for the stand');
    await venue.getByTestId('venue-home-screen').waitFor();
    await venue.goto(`${env.server.url}/venue/consignments/${consignmentId}`);
    await venue.getByTestId(`venue-piece-${changedLineId}-differences`).waitFor();
    await screenshot(venue, 'venue-consignment-wide');
    await expectAccessible(venue);
    expect(problemsOf(venue)).toEqual([]);
  });
});
