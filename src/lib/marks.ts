/** Reading marks whichever way the server names their author. */
import type { VariantMark } from './run-types';

export const markUserId = (m: VariantMark): number | undefined => m.user?.id ?? m.userId;
