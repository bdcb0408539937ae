/** On a device the app's files are in the app itself: nothing to register. */
export function registerServiceWorker(_onFirstControl?: () => void) {}
