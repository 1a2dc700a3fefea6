/**
 * Thickness resolution and uncertainty: how finely one sample of the stored time base resolves a
 * wall thickness measured from the first echo or between echoes, and how certainly (the GUM
 * combination of the velocity's and the sampling's standard uncertainties).
 */
package utdigit.core.thickness;
