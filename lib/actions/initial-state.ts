import type { ActionState } from './state';

/** The state a form starts in before its action has run. */
export const initialActionState: ActionState = { status: 0, ok: false };
