// Journey 4 (accounts part): invited by e-mail → follow the link from the caught message → sign up, confirm, sign in, accept → in the team as a viewer,
// who sees the members but none of the owner's controls, and whose direct attempt to invite is refused by the server.
import { expect, test } from '@playwright/test';
import { inviteViewerJourney, latestMailTo } from './helpers/accounts';

test('an invited person signs up from the e-mailed link and lands in the team as a viewer', async ({ browser }) => {
	// Two sign-ups, each confirmed through the caught mail: longer than one page's worth of steps.
	test.setTimeout(120_000);
	const ownerContext = await browser.newContext();
	const inviteeContext = await browser.newContext();
	const ownerPage = await ownerContext.newPage();
	const inviteePage = await inviteeContext.newPage();
	const teamName = `Kite Relay ${Date.now().toString(36)}`;

	const { owner, invitee, teamId, mail } = await inviteViewerJourney(ownerPage, inviteePage, teamName);
	// A fixed subject: the team name (anyone's free text) and links stay out of it; the body names the inviter's confirmed address.
	expect(mail.subject).toBe('An invitation to a team on Fringefield');
	expect(mail.text).toContain(`${owner.name} <${owner.email}> invited you`);
	expect(mail.text).toContain(`"${teamName}"`);
	expect(mail.text).toContain('as a viewer');

	// Landed in the team as a viewer, and it is the current team in the header.
	await expect(inviteePage.getByTestId('joined-banner')).toContainText(`You joined ${teamName} as viewer`);
	await expect(inviteePage.getByLabel('Team', { exact: true })).toHaveValue(teamId);
	await expect(inviteePage.locator('#team-switcher option:checked')).toHaveText(teamName);
	await expect(inviteePage.getByTestId('current-role')).toHaveText('viewer');

	// The team page shows the members but no owner controls.
	await inviteePage.goto(`/teams/${teamId}`);
	await expect(inviteePage.getByText('You are viewer here.')).toBeVisible();
	await expect(inviteePage.locator(`[data-testid=member-row][data-email="${owner.email}"]`)).toContainText('owner');
	await expect(inviteePage.locator(`[data-testid=member-row][data-email="${invitee.email}"]`)).toContainText('viewer');
	await expect(inviteePage.getByRole('button', { name: 'Send invitation' })).toHaveCount(0);
	await inviteePage.screenshot({ path: '/tmp/ff-team-as-viewer.png', fullPage: true });

	// The server refuses what the page hides: a viewer posting the invite action directly gets 403.
	const refused = await inviteePage.request.post(`/teams/${teamId}?/invite`, {
		form: { email: 'sneaky@e2e.test', role: 'owner' },
		headers: { origin: new URL(inviteePage.url()).origin, 'x-sveltekit-action': 'true' }
	});
	expect(refused.status()).toBe(403);
	expect(JSON.parse(await refused.text())).toMatchObject({ type: 'error', error: { message: expect.stringContaining('Only owners can rename the team, invite people or change their roles.') } });

	// The link was single-use: following it again says so.
	await inviteePage.goto(new URL(mail.links[0]).pathname);
	await expect(inviteePage.getByRole('alert')).toContainText('This invitation has been used already.');

	// The owner sees the new member.
	await ownerPage.goto(`/teams/${teamId}`);
	await expect(ownerPage.locator(`[data-testid=member-row][data-email="${invitee.email}"] select`)).toHaveValue('viewer');
	await ownerPage.screenshot({ path: '/tmp/ff-team-as-owner.png', fullPage: true });
	expect((await latestMailTo(ownerPage.request, invitee.email, 10_000, 'An invitation to a team on Fringefield')).links).toHaveLength(1);

	// The dev mailbox page shows the caught invitation with its link (and the confirmation mail that followed).
	await ownerPage.goto(`/dev/mailbox?to=${encodeURIComponent(invitee.email)}`);
	await expect(ownerPage.getByTestId('caught-mail')).toHaveCount(2);
	await expect(ownerPage.locator(`[data-testid=caught-mail] a[href="${mail.links[0]}"]`)).toHaveCount(1);
	await ownerPage.screenshot({ path: '/tmp/ff-dev-mailbox.png', fullPage: true });

	await ownerContext.close();
	await inviteeContext.close();
});
