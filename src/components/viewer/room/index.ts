/** "See it in the room": WebXR AR session and the USDZ link for phones' own AR viewers, both feature-detected. */
export { SeeInRoom } from './SeeInRoom';
