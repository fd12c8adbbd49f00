// The sizes and role names account forms share with the browser (the schemas themselves live in account.ts,
// which only server code imports: it carries the common-password list).
export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_LENGTH = 200;
export const TEAM_NAME_MAX_LENGTH = 80;
export const DISPLAY_NAME_MAX_LENGTH = 80;
export const TOKEN_NAME_MAX_LENGTH = 60;

export const teamRoles = ['owner', 'editor', 'viewer'] as const;
