/**
 * The pure calculation core: physics and arithmetic of digitizing ultrasonic A-scans, organised by
 * feature (pulse, sampling, quantization, timing, thickness, acquisition, materials, rules, sheets).
 *
 * <p>Rules of this package tree, enforced by an ArchUnit test: no Spring, Jackson, Jakarta or
 * servlet imports; immutable records with static factories; every raw {@code double} carries its
 * unit in its name ({@code samplingIntervalNs}); transcendental functions come from
 * {@link java.lang.StrictMath} so that results hashed into stamps are bit-identical on every
 * platform.
 */
package utdigit.core;
