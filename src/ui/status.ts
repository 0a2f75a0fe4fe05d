/** The status look lives with the exports, so a printed drawing and the screen agree. */
export { STATUS_LOOK, statusLook, type StatusLook } from '../export/statusLook.ts';
