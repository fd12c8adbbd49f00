// rate_limit: rate-limiter-flexible's counters (written by the library; tests read them). expire is epoch ms.
import type { ColumnType, Selectable } from 'kysely';

export interface RateLimitTable {
	key: string;
	points: number;
	expire: ColumnType<string | null, number | null, number | null>;
}
export type RateLimitRow = Selectable<RateLimitTable>;
