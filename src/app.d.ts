// See https://svelte.dev/docs/kit/types#app.d.ts
import type { RequestIdentity, RequestUser } from '$lib/server/auth/request-identity';

declare global {
	namespace App {
		interface Error {
			message: string;
			errorId?: string;
		}
		interface Locals {
			user: RequestUser | null;
			sessionId: string | null;
			apiToken: RequestIdentity['apiToken'];
			identity: RequestIdentity;
		}
	}
}

export {};
