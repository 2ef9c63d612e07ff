/** A pump moved to another wavelength (the blend model's `shiftPump`, used by bins and the thermal model). */
export { shiftPump } from '../blend/shiftPump';
