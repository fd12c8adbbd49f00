// What an error page says, in a user's words, and where its way back leads: pure, so it is tested beside the page.

export interface ErrorPageWords {
	/** The heading: what happened, in a few words. */
	title: string;
	/** One or two sentences for the reader; never an internal name. */
	detail: string;
	/** The way back: the design when the address names one that exists, else the designs list (or the start page when signed out). */
	back: { href: string; label: string };
}

export interface ErrorPageContext {
	status: number;
	message: string | undefined;
	/** The route's `designId` parameter when the failed address was inside a design. */
	designId?: string;
	signedIn: boolean;
}

const INTERNAL_ACTION = /\(([a-z-]+\.[a-z-]+)\)/;

export function errorPageWords({ status, message, designId, signedIn }: ErrorPageContext): ErrorPageWords {
	const said = (message ?? '').trim();
	const list = signedIn ? { href: '/designs', label: 'Back to your designs' } : { href: '/', label: 'Back to the start page' };
	const design = designId && signedIn ? { href: `/designs/${encodeURIComponent(designId)}`, label: 'Back to the design' } : list;
	switch (status) {
		case 403:
			return {
				title: 'Your role does not allow this',
				detail: said && !INTERNAL_ACTION.test(said) ? said : 'Ask an owner of the team if you need a different role.',
				back: design
			};
		case 404: {
			const designMissing = /^design( or revision)? not found$/i.test(said);
			const specific = said && said.toLowerCase() !== 'not found';
			return {
				title: designMissing ? 'This design is not here' : specific ? said : 'There is no page at this address',
				detail: designMissing
					? 'It may have been deleted, or it belongs to a team you are not a member of.'
					: specific
						? 'It may have been deleted, or it belongs to a team you are not a member of.'
						: 'Check the address, or go back and follow a link.',
				back: designMissing ? list : design
			};
		}
		case 422:
			return {
				title: 'The files were not made',
				detail: said || 'The design breaks a rule of the chosen fab profile.',
				back: design
			};
		case 503:
			return {
				title: 'Fringefield is busy right now',
				detail: 'The server or its database could not answer in time. Nothing was lost: try again in a minute.',
				back: design
			};
		default:
			return status >= 500
				? { title: 'Something went wrong on our side', detail: 'We have logged it. If it happens again, send us the reference below.', back: design }
				: { title: 'The request was refused', detail: said || 'Go back and try again.', back: design };
	}
}
