// The typed Database: one entry per table, each defined in its own <table>.table.ts.
import type { AppUserTable } from './app-user.table';
import type { UserSessionTable } from './user-session.table';

export interface Database {
	app_user: AppUserTable;
	user_session: UserSessionTable;
}
