/** The address a label's code opens: the tank's page on this Roundtide. */
export const tankAddress = (tankId: number) => `${window.location.origin}/tanks/${tankId}`
