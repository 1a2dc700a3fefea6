/**
 * Distance-amplitude correction and time-corrected gain against the amplitude quantization: what a
 * DAC curve's span costs in resolution with no correction, with TCG before the converter and with TCG
 * applied to digitized data. Every quantization figure comes from
 * {@link utdigit.core.quantization.QuantizationCalculator}.
 */
package utdigit.core.dac;
