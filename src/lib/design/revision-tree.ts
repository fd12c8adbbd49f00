// Revisions laid out as a history tree: depth-first from the first revision, a new lane for each fork.

export interface TreeRevision {
	id: string;
	label: string;
	seq: number;
	parentId: string | null;
}

export interface TreeRow<R extends TreeRevision> {
	revision: R;
	/** 0 for the main line; each further child of a revision opens the next lane. */
	lane: number;
	/** True when this revision's parent has more than one child. */
	forked: boolean;
}

export function revisionTree<R extends TreeRevision>(revisions: readonly R[]): TreeRow<R>[] {
	const children = new Map<string | null, R[]>();
	const ids = new Set(revisions.map((r) => r.id));
	for (const r of [...revisions].sort((a, b) => a.seq - b.seq)) {
		const key = r.parentId && ids.has(r.parentId) ? r.parentId : null;
		children.set(key, [...(children.get(key) ?? []), r]);
	}
	const rows: TreeRow<R>[] = [];
	let nextLane = 0;
	const walk = (r: R, lane: number, forked: boolean) => {
		rows.push({ revision: r, lane, forked });
		const kids = children.get(r.id) ?? [];
		kids.forEach((k, i) => walk(k, i === 0 ? lane : ++nextLane, kids.length > 1));
	};
	for (const root of children.get(null) ?? []) walk(root, nextLane === 0 && rows.length === 0 ? 0 : ++nextLane, false);
	return rows;
}
