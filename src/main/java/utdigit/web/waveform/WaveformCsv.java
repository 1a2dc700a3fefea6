package utdigit.web.waveform;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;
import utdigit.web.problem.FieldError;
import utdigit.web.problem.InputProblem;

/**
 * A text/csv record: a header row, then one row per sample; either one column of amplitudes
 * ({@code amplitude}) or two, {@code time_<unit>,amplitude} with the unit s, ms, us or ns, from
 * which the record's rate is taken (the times must be equally spaced). The other inputs come as
 * query parameters named as in the JSON request. The CSV becomes the JSON request, so that both
 * bodies take the one path to the answer; a bad cell is a 400 at {@code /samples/<i>} (data row
 * i + 1) naming its row and column.
 */
final class WaveformCsv {
    private WaveformCsv() {}

    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;
    /** Seconds per unit of a time column. */
    private static final Map<String, Double> TIME_UNITS_US = Map.of("s", 1e6, "ms", 1e3, "us", 1.0, "ns", 1e-3);
    /** Relative departure of a time step from the mean step that is still "equally spaced". */
    static final double SPACING_TOLERANCE = 1e-3;
    /** Query parameters that are numbers, and those that are integers. */
    private static final List<String> NUMBERS = List.of("record_sampling_frequency_mhz", "sampling_frequency_mhz",
            "amplitude_tolerance_db");
    private static final List<String> INTEGERS = List.of("decimation_factor");
    private static final List<String> NAMES = List.of("centre_frequency_convention", "decimation_mode", "peak_reading");

    /** The JSON request for a CSV body and its query parameters. */
    static ObjectNode request(String body, Map<String, String> parameters) {
        ObjectNode request = NODES.objectNode();
        for (Map.Entry<String, String> p : parameters.entrySet()) {
            String name = p.getKey();
            String value = p.getValue();
            if (NUMBERS.contains(name) || INTEGERS.contains(name)) {
                try {
                    if (INTEGERS.contains(name)) {
                        request.put(name, Integer.parseInt(value.trim()));
                    } else {
                        double v = Double.parseDouble(value.trim());
                        if (!Double.isFinite(v)) {
                            throw new NumberFormatException();
                        }
                        request.put(name, v);
                    }
                } catch (NumberFormatException e) {
                    throw InputProblem.invalid("/" + name, "must be a " + (INTEGERS.contains(name) ? "whole " : "finite ")
                            + "number (query parameter)");
                }
            } else if (NAMES.contains(name)) {
                request.put(name, value);
            } else {
                throw InputProblem.invalid("/" + name, "is not a parameter of a CSV waveform (give "
                        + String.join(", ", allNames()) + ")");
            }
        }
        String text = body.startsWith("\uFEFF") ? body.substring(1) : body;
        String[] lines = text.split("\r?\n", -1);
        int first = 0;
        while (first < lines.length && lines[first].isBlank()) {
            first++;
        }
        if (first == lines.length) {
            throw InputProblem.invalid("", "the CSV body is empty: a header row (amplitude, or time_us,amplitude) "
                    + "and one row per sample are required");
        }
        String[] header = cells(lines[first]);
        Double timeToUs = null;
        String timeColumn = null;
        if (header.length == 2) {
            timeColumn = header[0];
            String unit = timeColumn.toLowerCase(Locale.ROOT).startsWith("time_")
                    ? timeColumn.substring("time_".length()).toLowerCase(Locale.ROOT) : "";
            timeToUs = TIME_UNITS_US.get(unit);
            if (timeToUs == null || !header[1].equalsIgnoreCase("amplitude")) {
                throw InputProblem.invalid("", "the CSV header must be 'amplitude' or 'time_<unit>,amplitude' with "
                        + "the unit s, ms, us or ns; got '" + String.join(",", header) + "'");
            }
        } else if (header.length != 1 || !header[0].equalsIgnoreCase("amplitude")) {
            throw InputProblem.invalid("", "the CSV header must be 'amplitude' or 'time_<unit>,amplitude' with the "
                    + "unit s, ms, us or ns; got '" + String.join(",", header) + "'");
        }
        ArrayNode samples = request.putArray("samples");
        List<Double> times = new ArrayList<>();
        List<FieldError> errors = new ArrayList<>();
        int row = 0;
        for (int l = first + 1; l < lines.length; l++) {
            if (lines[l].isBlank()) {
                continue;
            }
            row++;
            if (row > utdigit.core.waveform.WaveformInput.MAX_SAMPLES) {
                throw InputProblem.invalid("/samples", "the record has more than "
                        + utdigit.core.waveform.WaveformInput.MAX_SAMPLES + " rows");
            }
            String[] c = cells(lines[l]);
            String pointer = "/samples/" + (row - 1);
            if (c.length != header.length) {
                errors.add(new FieldError(pointer, "row " + row + " has " + c.length + " cells; the header has "
                        + header.length));
                continue;
            }
            Double amplitude = number(c[c.length - 1]);
            if (amplitude == null) {
                errors.add(new FieldError(pointer, "row " + row + ", column amplitude: must be a finite number"));
            } else {
                samples.add(amplitude);
            }
            if (timeColumn != null) {
                Double t = number(c[0]);
                if (t == null) {
                    errors.add(new FieldError(pointer, "row " + row + ", column " + timeColumn
                            + ": must be a finite number"));
                } else {
                    times.add(t * timeToUs);
                }
            }
        }
        if (!errors.isEmpty()) {
            throw InputProblem.invalid(errors.size() > 20 ? errors.subList(0, 20) : errors);
        }
        if (timeColumn != null) {
            if (request.has("record_sampling_frequency_mhz")) {
                throw InputProblem.invalid("/record_sampling_frequency_mhz", "give the record's rate once: the "
                        + timeColumn + " column already gives it");
            }
            if (times.size() >= 2) {
                double stepUs = (times.get(times.size() - 1) - times.get(0)) / (times.size() - 1);
                if (!(stepUs > 0)) {
                    throw InputProblem.invalid("/samples", "the " + timeColumn + " column must increase");
                }
                for (int i = 1; i < times.size(); i++) {
                    double step = times.get(i) - times.get(i - 1);
                    if (StrictMath.abs(step - stepUs) > SPACING_TOLERANCE * stepUs) {
                        throw InputProblem.invalid("/samples/" + i, "row " + (i + 1) + ", column " + timeColumn
                                + ": the samples must be equally spaced in time (step " + step + " us against the mean "
                                + stepUs + " us)");
                    }
                }
                request.put("record_sampling_frequency_mhz", 1.0 / stepUs);
            }
        }
        return request;
    }

    private static List<String> allNames() {
        List<String> all = new ArrayList<>(NUMBERS);
        all.addAll(INTEGERS);
        all.addAll(NAMES);
        return all;
    }

    private static String[] cells(String line) {
        String[] c = line.split(",", -1);
        for (int i = 0; i < c.length; i++) {
            String s = c[i].trim();
            if (s.length() >= 2 && s.startsWith("\"") && s.endsWith("\"")) {
                s = s.substring(1, s.length() - 1).trim();
            }
            c[i] = s;
        }
        return c;
    }

    private static Double number(String cell) {
        try {
            double v = Double.parseDouble(cell);
            return Double.isFinite(v) && !cell.isEmpty() && !cell.endsWith("d") && !cell.endsWith("f")
                    && !cell.endsWith("D") && !cell.endsWith("F") ? v : null;
        } catch (NumberFormatException e) {
            return null;
        }
    }
}
