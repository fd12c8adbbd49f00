// Public face of server/fab-profiles: a team's fab capability profiles and the profile a revision is checked against.
export {
	addFabProfile,
	BUILT_IN_FAB_PROFILE_ID,
	builtInFabProfile,
	listFabProfiles,
	matchingFabProfileId,
	resolveFabProfileChoice,
	revisionFabCheck,
	revisionFabProfile,
	type RecordedFabProfile,
	type RevisionFabCheck,
	type TeamFabProfile
} from './fab-profiles';
