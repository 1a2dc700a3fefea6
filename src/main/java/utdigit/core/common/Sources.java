package utdigit.core.common;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The reference catalogue: every source an answer cites, with how it was checked. Answers carry
 * {@code references} as {topic, id}; the catalogue ({@code GET /api/references}) gives the full
 * citation. Derivations and practices point to their section of the methods document
 * ({@code src/docs/methods.md}).
 */
public final class Sources {
    private Sources() {}

    private static final Map<String, Source> BY_ID = new LinkedHashMap<>();

    private static final String METHODS = "src/docs/methods.md (this service's methods document)";

    private static Source add(String id, SourceKind kind, String document, String edition, String locator,
                              SourceCheck checked, String note) {
        Source s = new Source(id, kind, document, edition, locator, checked, note);
        if (BY_ID.putIfAbsent(id, s) != null) {
            throw new IllegalStateException("duplicate source id " + id);
        }
        return s;
    }

    private static Source derivation(String id, String section, String what) {
        return add(id, SourceKind.DERIVATION, METHODS, null, section, SourceCheck.DERIVED, what);
    }

    private static Source practice(String id, String section, String what) {
        return add(id, SourceKind.COMMON_PRACTICE, METHODS, null, section, SourceCheck.NOT_PUBLISHED,
                "common practice, no published source: " + what);
    }

    /** A clause of JCGM 100:2008, the GUM; {@code locator} begins with the clause number. */
    private static Source gum(String clause, String locator, SourceCheck checked, String note) {
        return add("jcgm-100-2008-" + clause, SourceKind.STANDARD, "JCGM 100, Evaluation of measurement data - "
                + "Guide to the expression of uncertainty in measurement (GUM)", "2008", locator, checked, note);
    }

    // ---- standards and metrology guides ----

    public static final Source ISO_22232_2_STEEL = add("iso-22232-2-steel-reference-values", SourceKind.STANDARD,
            "ISO 22232-2, Non-destructive testing - Characterization and verification of ultrasonic test "
                    + "equipment - Part 2: Probes", "2020 (first edition)", "1 Scope",
            SourceCheck.READ, "read in the scope on two national-body catalogue pages: material-dependent values "
                    + "of the standard are based on steel of (5920 +/- 50) m/s longitudinal and (3255 +/- 30) m/s "
                    + "transverse; the +/- values are read as half-widths (the scope does not call them standard "
                    + "uncertainties)");

    public static final Source ASTM_E1065 = add("astm-e1065-bandwidth", SourceKind.STANDARD,
            "ASTM E1065/E1065M, Standard Practice for Evaluating Characteristics of Ultrasonic Search Units",
            "E1065/E1065M-20", "3.2.2 (bandwidth between the -6 dB points of the frequency response)",
            SourceCheck.READ_SECOND_HAND, "scope, significance and keywords (frequency response, bandwidth, peak "
                    + "frequency) read on catalogue pages; the definition clause itself was not read here and is "
                    + "taken from an earlier reading recorded in the project; the -6 dB reference level is also "
                    + "the parameter of the pulse model (scipy gausspulse bwr = -6, read)");

    public static final Source ASTM_E494 = add("astm-e494-velocity-table", SourceKind.STANDARD,
            "ASTM E494, Standard Practice for Measuring Ultrasonic Velocity in Materials", "E494-20",
            "Table X3.1 (nominal velocities); 1 Scope",
            SourceCheck.READ_SECOND_HAND, "scope read on catalogue pages (comparative pulse-echo velocity "
                    + "measurement; absolute readings vary by as much as 5 %, relative ones about 1 %, read in the "
                    + "E494-05/-10 scope notes); the table values were transcribed in an earlier reading recorded in "
                    + "the project and not re-read here");

    public static final Source GUM_RECTANGULAR = gum("4.3.7",
            "4.3.7 (rectangular distribution: u = a/sqrt(3) for a half-width a)", SourceCheck.READ_SECOND_HAND,
            "u = a/sqrt(3) read in a metrology guide's worked example of a "
                    + "rectangular distribution (semi-range 1.5 gives 0.87); the clause number was not read in the "
                    + "GUM itself; the variance a^2/3 is also derived in the methods document, section 3.6");

    public static final Source GUM_TRIANGULAR = gum("4.3.9", "4.3.9 (triangular distribution: u = a/sqrt(6))",
            SourceCheck.DERIVED, "the clause was not read; the variance a^2/6 of the difference of two independent "
                    + "rectangular errors of half-width a/2 is derived in the methods document, section 3.6");

    public static final Source GUM_PROPAGATION = gum("5.1.2",
            "5.1.2, equation (10) (law of propagation of uncertainty, uncorrelated inputs)", SourceCheck.DERIVED, "the clause was not read; the first-order propagation for d = v t/(2m) is "
                    + "written out in the methods document, section 6.4");

    public static final Source GUM_EXPANDED = gum("6.2", "6.2 (expanded uncertainty U = k u_c)",
            SourceCheck.READ_SECOND_HAND, "U = k u_c(y), k typically 2 to 3, about 95 % for k = 2 only when the "
                    + "normal distribution applies: read in NIST Technical Note 1297, section 6, which follows the GUM");

    // ---- papers and published tables ----

    public static final Source MARCZAK_1997 = add("marczak-1997-water", SourceKind.PAPER,
            "W. Marczak, Water as a standard in the measurements of speed of sound in liquids, "
                    + "J. Acoust. Soc. Am. 102 (1997) 2776-2779", "1997", "the fifth-order polynomial c(T), 0 to 95 C",
            SourceCheck.READ_SECOND_HAND, "the paper was not read; its coefficients (1402.385, 5.038813, "
                    + "-5.799136e-2, 3.287156e-4, -1.398845e-6, 2.787860e-9) and range 0-95 C were read in two texts "
                    + "that reproduce it (an acoustics toolbox's documentation and a sonar reference page)");

    public static final Source CRC_SOUND_SPEED = add("crc-handbook-speed-of-sound", SourceKind.BOOK,
            "CRC Handbook of Chemistry and Physics, section 14: Speed of sound in various bulk media, Table 1 (solids)",
            "online edition", "Table 1: brass (70 Cu, 30 Zn), iron cast, nickel",
            SourceCheck.READ, "read in the handbook's online table: brass (70 Cu, 30 Zn) 4700 / 2110 m/s, iron cast "
                    + "4994 / 2809 m/s (longitudinal / shear)");

    public static final Source ACOUSTIC_PROPERTIES_TABLE = add("acoustic-properties-common-materials",
            SourceKind.PAPER, "Acoustical Properties of Common Materials (velocity table of the NDT trade, "
                    + "reproduced by instrument distributors)", null,
            "rows Steel CRES 300 Series; Iron (Cast), Various Alloys",
            SourceCheck.READ_SECOND_HAND, "read in a distributor's reproduction: CRES 300 series 5613-5740 / "
                    + "3048-3124 m/s, cast irons 3505-5588 / 2210-3200 m/s; the same reproduction gives Inconel "
                    + "(wrought) 7823 m/s, evidently an error, so its nickel-alloy row is not used");

    public static final Source ULTRASONIC_PROPERTIES_TABLE = add("ultrasonic-properties-table", SourceKind.PAPER,
            "Table of Ultrasonic Properties (transducer maker's published table, Boston Piezo-Optics)", "2010",
            "rows Glycerine, Lucite",
            SourceCheck.READ, "read: glycerine 1920 m/s; Lucite (PMMA) 2680 / 1260 m/s");

    public static final Source GAUGE_VELOCITY_TABLES = add("gauge-manual-velocity-tables", SourceKind.PAPER,
            "Sound velocity tables in the appendices of ultrasonic thickness gauge manuals (Olympus 45MG, "
                    + "DMTA-10022-01EN Rev. C 2015, Table 28; two further makers' appendix tables)", null,
            "rows Polystyrene, Titanium, Inconel, Oil (SAE 30), Glycerin",
            SourceCheck.READ, "read: polystyrene 2340 m/s (Table 28; another maker 2337 m/s); titanium Ti 150A "
                    + "6100 m/s (Table 28); Inconel 5700 m/s, oil (SAE 30) 1700 m/s, glycerin 1900 m/s (two other "
                    + "makers); longitudinal only");

    public static final Source SOLIDS_PROPERTIES_TABLE = add("acoustic-properties-of-solids", SourceKind.PAPER,
            "Acoustic Properties of Solids (published table of a transducer-simulation vendor)", null, "row Inconel",
            SourceCheck.READ, "read: Inconel 5.7 / 3.0 mm/us (longitudinal / shear)");

    // ---- libraries ----

    public static final Source SCIPY_GAUSSPULSE = add("scipy-gausspulse", SourceKind.LIBRARY,
            "SciPy, scipy.signal.gausspulse", "1.x documentation", "function reference",
            SourceCheck.READ, "read: exp(-a t^2) exp(1j 2 pi fc t), bw the fractional bandwidth at reference level "
                    + "bwr = -6 dB; the closed form of a is derived in the methods document, section 2.2");

    public static final Source COMMONS_MATH_BESSEL = add("commons-math-besselj", SourceKind.LIBRARY,
            "Apache Commons Math, org.apache.commons.math3.special.BesselJ", "3.6.1",
            "BesselJ.value(order, x)", SourceCheck.READ, "read: the class computes Bessel functions of the first "
                    + "kind (its source, as kept in the 4.x legacy module); used for J1 of the piston directivity");

    public static final Source COMMONS_MATH_ERF = add("commons-math-erf", SourceKind.LIBRARY,
            "Apache Commons Math, org.apache.commons.math3.special.Erf", "3.6.1", "Erf.erfc(x)",
            SourceCheck.READ_SECOND_HAND, "the 3.6.1 page was not read; the Erf family's source history read in the "
                    + "project's commit archive; pure-Java arithmetic, platform-independent");

    public static final Source COMMONS_MATH_BRENT = add("commons-math-brent-solver", SourceKind.LIBRARY,
            "Apache Commons Math, org.apache.commons.math3.analysis.solvers.BrentSolver", "3.6.1",
            "solve(maxEval, f, min, max)", SourceCheck.READ, "read: Brent's algorithm for a zero of a continuous "
                    + "function bracketed by [a, b], to within 2 eps |x| + t (its source, as kept in the 4.x legacy "
                    + "module)");

    // ---- derivations (methods document) ----

    public static final Source DEFINITIONS = derivation("definitions", "1 Conventions and definitions",
            "definitions: T = 1/f, lambda = v/f, dt = m/fs, dB levels, sound path per sample, angle-beam geometry, "
                    + "d = v t/(2m), 2^N levels, dynamic range, MB = 10^6 bytes");
    public static final Source CENTRE_FREQUENCY = derivation("centre-frequency-conventions",
            "2.1 Band edges and centre frequency", "ARITHMETIC fc = (fl + fu)/2 and GEOMETRIC fc = sqrt(fl fu), "
                    + "with BW = (fu - fl)/fc; which standard uses which convention was not read: the caller chooses");
    public static final Source GAUSSIAN_MODEL = derivation("gaussian-pulse-model", "2.2 Gaussian pulse model",
            "the model's a from bw, band edges L dB down at fc +/- (bw fc/2) sqrt(L/6), envelope durations");
    public static final Source REAL_LOWER_EDGE = derivation("real-pulse-lower-edge", "2.3 The real pulse's lower edge",
            "spectrum G(f - fc) + G(f + fc) of the real pulse; roots by Brent's method");
    public static final Source PISTON_NEAR_FIELD = derivation("piston-near-field", "2.5 Near field",
            "last on-axis maximum (D^2 - lambda^2)/(4 lambda) from the on-axis pressure of a circular piston");
    public static final Source PISTON_DIRECTIVITY = derivation("piston-directivity", "2.6 Beam spread",
            "far-field directivity 2 J1(x)/x of a circular piston (Fraunhofer integral), k solved numerically");
    public static final Source SNELL = derivation("snell-law", "2.8 Refraction", "Snell's law from phase matching "
            + "along the interface");
    public static final Source SINE_BOUND = derivation("sine-sampling-bound", "3.2 Sine bound",
            "-20 log10(cos(pi/n)) for a peak midway between two samples, n > 2");
    public static final Source PULSE_SAMPLING_LOSS = derivation("pulse-sampling-loss", "3.3 Pulse amplitude loss",
            "worst case over the sampling phase, exact search, never above cos(pi/n) exp(-a dt^2/4). The carrier "
                    + "phase is fixed at 0 (a carrier crest at the envelope's peak); an echo of another carrier phase "
                    + "can read lower against its own peak: by up to about 0.05 dB for bandwidths of 40-100 % at 5 or "
                    + "more samples per period, up to about 0.3 dB for narrower or wider bands there, and up to about "
                    + "0.8 dB below 5 samples per period (brute-force scan over the carrier phase; not searched)");
    public static final Source REQUIRED_RATE = derivation("required-sampling-rate", "3.4 Required sampling rates",
            "inverse of the sine bound and of the pulse loss (scan and bisection, resonant rates checked)");
    public static final Source SPECTRAL_MODEL = derivation("spectral-model", "3.5 Spectral level and energy at Nyquist",
            "model values of the Gaussian pulse: optimistic for real probes");
    public static final Source ENVELOPE_SPECTRAL_MODEL = derivation("envelope-spectral-model",
            "3.5 Spectral level and energy at Nyquist", "signal ENVELOPE: the detected envelope's spectrum, centred "
                    + "at 0 Hz: level -6 ((fs/2)/(B/2))^2 dB, energy above fs/2 erfc((fs/2)/(sigma_f sqrt 2)); model "
                    + "values, optimistic for real probes");
    public static final Source WAVEFORM_PREPARATION = derivation("waveform-preparation", "12 Waveform analyses",
            "mean removed; a Tukey window (taper 20 %) when the echo is cut by the record's ends");
    public static final Source WAVEFORM_SPECTRUM = derivation("waveform-spectrum", "12 Waveform analyses",
            "|DFT| of the prepared, zero-padded record (Apache Commons Math FastFourierTransformer); band edges by "
                    + "linear interpolation between the bins straddling the level");
    public static final Source WAVEFORM_ADEQUACY = practice("waveform-record-adequacy", "12 Waveform analyses",
            "the record's energy near its own Nyquist frequency: warning and refusal thresholds");
    public static final Source WAVEFORM_ENVELOPE = derivation("waveform-envelope", "12 Waveform analyses",
            "envelope as the magnitude of the analytic signal (Hilbert transform by FFT); -6 and -20 dB durations "
                    + "by linear interpolation; cycles = -6 dB duration x centre frequency");
    public static final Source WAVEFORM_MODEL = derivation("waveform-gaussian-model", "12 Waveform analyses",
            "the Gaussian pulse model with the measured -6 dB edges, judged by the sampling assessment's calculator");
    public static final Source WAVEFORM_ENERGY = derivation("waveform-energy-above-nyquist", "12 Waveform analyses",
            "fraction of the record's spectral energy above half the rate that decides amplitude");
    public static final Source WAVEFORM_LOSS = derivation("waveform-pulse-loss", "12 Waveform analyses",
            "worst case over the sampling phase on the band-limited reconstruction of the record (DFT zero-padding, "
                    + "32 points per sample, cubic interpolation, minima refined by Brent's method)");
    public static final Source WAVEFORM_REQUIRED_RATE = derivation("waveform-required-rate", "12 Waveform analyses",
            "the rate above which every rate keeps the record's loss within the tolerance: curvature bound start, "
                    + "downward scan, bisection");
    public static final Source RECTANGULAR_DIRECTIVITY = derivation("rectangular-directivity", "13 Array apertures",
            "far-field directivity sin(x)/x of a uniform rectangular aperture, x = pi L sin(theta)/lambda; "
                    + "pulse-echo half-angles solved numerically (Apache Commons Math BrentSolver)");
    public static final Source GRATING_LOBES = derivation("grating-lobes", "13 Array apertures",
            "sin(theta_g) = sin(theta_s) -/+ m lambda/p; none in the medium while p < lambda/(1 + |sin(theta_s)|)");
    public static final Source SCAN_COVERAGE = derivation("scan-coverage", "14 Scan coverage",
            "Gaussian main lobe of pulse-echo -6 dB width w: a reflector midway between positions dx apart reads "
                    + "6 (dx/w)^2 dB low; largest step w sqrt(X/6); an angular step moves the beam z dtheta");
    public static final Source DAC_TCG = derivation("dac-tcg-quantization", "15 DAC and TCG",
            "lowest DAC point S dB below the reference; TCG before the converter costs no resolution, TCG on "
                    + "digitized data scales the LSB by 10^(S/20); largest span 20 log10(h_ref/h_min)");
    public static final Source TOFD_DEPTH_UNCERTAINTY = derivation("tofd-depth-uncertainty", "16 TOFD set-up",
            "d = sqrt((v t/2)^2 - S^2): dd/dt = v^2 t/(4 d), dd/dS = -S/d, combined by the law of propagation of "
                    + "uncertainty, U = k u");
    public static final Source TIMING = derivation("timing-quantization", "3.6 Timing quantization",
            "worst case dt/2 and dt/sqrt(12) for one instant; dt and dt/sqrt(6) for a difference of two");
    public static final Source TFM_GRID = derivation("tfm-grid-model", "3.7 TFM grid", "a model of ours: depth "
            + "and lateral grid losses; the code's own amplitude-fidelity check governs");
    public static final Source CODE_MAPPING = derivation("quantizer-code-mapping", "4.1 Levels and LSB",
            "LSB = FSR/2^N (FSR_OVER_2N); rectifying RF after digitizing leaves 2^(N-1) levels");
    public static final Source IDEAL_SQNR = derivation("ideal-sqnr", "4.2 Ideal SQNR",
            "20 log10(2^N) + 10 log10(1.5) from a full-scale sine and uniform quantization noise LSB^2/12");
    public static final Source QUANTIZATION_ERROR = derivation("quantization-error-bounds",
            "4.3 Amplitude error and minimum height", "error bounds of ROUNDING and TRUNCATION at a height, "
                    + "minimum height for a tolerance");
    public static final Source SOFT_GAIN = derivation("soft-gain-and-averaging", "4.4 Digital gain and averaging",
            "gain after digitizing scales heights and LSB alike; averaging M gives 10 log10(M) dB");
    public static final Source TOFD_GEOMETRY = derivation("tofd-geometry", "5.2 TOFD", "symmetric-probe geometry by "
            + "Pythagoras: times, depth, depth step, dead zones, pulse-limited resolution, off-centre tips");
    public static final Source VELOCITY_UNCERTAINTY = derivation("velocity-uncertainty", "6.3 Velocity uncertainty",
            "a caller's value is a standard uncertainty; a material's half-width a gives a/sqrt(3)");
    public static final Source THICKNESS_UNCERTAINTY = derivation("thickness-uncertainty",
            "6.4 Combined and expanded uncertainty", "u_d^2 = (t/(2m))^2 u_v^2 + (v/(2m))^2 u_t^2");
    public static final Source COMBINED_AMPLITUDE = derivation("combined-amplitude-error",
            "8 Technique sheets", "worst case of sampling and quantization together: sampling lowers the peak "
                    + "by r_s, the quantizer then errs by up to b at that lower height: -20 log10(r_s - b/h) dB");
    public static final Source DYNAMIC_RANGE = derivation("dynamic-range", "4.4 Digital gain and averaging",
            "20 log10(100 %FSH / LSB) - max(G, 0) dB: a negative soft gain adds no range");
    public static final Source INCIDENCE_PLANE = derivation("incidence-plane-aperture", "2.9 Angle beams",
            "projected aperture D cos(beta)/cos(alpha) in the incidence plane; near field and beam spread there "
                    + "from it; the wedge path carried into the part by (v_w/v) cos^2(beta)/cos^2(alpha)");

    // ---- practices of the trade ----

    public static final Source DECIMATION = practice("decimation-modes", "3.1 Sampling interval and decimation",
            "DROP keeps every m-th sample, PEAK_PRESERVING the largest |sample| of each group of m");
    public static final Source PULSE_LENGTH = practice("spatial-pulse-length", "2.4 Spatial pulse length",
            "spatial pulse length v tau(-6 dB) and axial resolution half of it");
    public static final Source ARRAY_APERTURE = practice("array-active-aperture", "13 Array apertures",
            "n elements at pitch p span n p");
    public static final Source RECTANGULAR_NEAR_FIELD = practice("rectangular-near-field", "13 Array apertures",
            "L^2/(4 lambda) in the plane of the side L (steering plane of a linear array)");
    public static final Source TOFD_GATE = practice("tofd-gate", "16 TOFD set-up",
            "the gate opens before the lateral wave and closes after the back wall, a pulse duration's margin each side");
    public static final Source BEAM_ANGLE_TOLERANCE = practice("beam-angle-tolerance", "8 Technique sheets",
            "an angle probe's beam angle measured on a reference block is usually accepted within 2 degrees of the "
                    + "angle the technique states; beyond that the stated angle and the wedge disagree");
    public static final Source NEAR_FIELD_PRACTICE = practice("near-field-practice", "2.5 Near field, 2.7 Beam diameter",
            "N = D^2/(4 lambda); the near field left in the part behind a wedge N - w v_w/v; beam diameter "
                    + "2 z tan(theta) in the far field");
    public static final Source MAX_CODE = practice("max-code-mapping", "4.1 Levels and LSB",
            "full screen at the largest code: LSB = 100/(2^(N-1) - 1) (RF) or 100/(2^N - 1) (RECTIFIED)");
    public static final Source ACQUISITION_COUNTING = practice("acquisition-counting", "7 Acquisition budget",
            "samples per A-scan, bytes per sample, firings and A-scans per position, data volume and rate");
    public static final Source SCAN_SPEED = practice("scan-speed", "7 Acquisition budget",
            "v_max = PRF x increment/(firings x averaging): the PRF counts firings");
    public static final Source WRAPAROUND = practice("wraparound-prf", "7 Acquisition budget",
            "PRF_max = 1/(q t_rt) with a decay factor q >= 1");

    /** Every catalogue entry, in a stable order. */
    public static List<Source> all() {
        return List.copyOf(BY_ID.values());
    }

    /** The entry with this id, if catalogued. */
    public static Optional<Source> find(String id) {
        return Optional.ofNullable(id == null ? null : BY_ID.get(id));
    }
}
