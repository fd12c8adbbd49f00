// The pages of one revision, in the one set of words every link to them uses: the revision page's bar and each
// sub-page's tabs read from here, and each sub-page's heading says the same words.
export type RevisionPageId = 'revision' | 'sweeps' | 'measurements' | 'tolerance';

export const revisionPages: readonly { id: RevisionPageId; path: string; label: string }[] = [
	{ id: 'revision', path: '', label: 'Revision' },
	{ id: 'sweeps', path: '/sweeps', label: 'Sweep plans' },
	{ id: 'measurements', path: '/measurements', label: 'Measured S11' },
	{ id: 'tolerance', path: '/tolerance', label: 'Tolerance study' }
];

/** The words for one revision page (its tab, the links to it, its heading). */
export const revisionPageLabel = (id: RevisionPageId): string => revisionPages.find((p) => p.id === id)!.label;
