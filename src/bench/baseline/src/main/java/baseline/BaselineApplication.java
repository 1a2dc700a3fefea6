package baseline;

import org.springframework.boot.SpringApplication;
import org.springframework.boot.autoconfigure.SpringBootApplication;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

/**
 * The same stack's empty application for src/bench/http-bench.sh: one POST endpoint that reads a
 * small JSON object and answers a small JSON object, with no validation, security, actuator or
 * stamp. Every endpoint of the service is measured as a ratio of this one's throughput.
 */
@SpringBootApplication
@RestController
public class BaselineApplication {

    /** The request: a probe frequency and a sampling frequency, both in MHz. */
    public record Request(double frequencyMhz, double samplingFrequencyMhz) {
    }

    /** The answer: the samples per period of the probe frequency. */
    public record Answer(double samplesPerPeriod) {
    }

    @PostMapping("/baseline")
    Answer answer(@RequestBody Request request) {
        return new Answer(request.samplingFrequencyMhz() / request.frequencyMhz());
    }

    public static void main(String[] args) {
        SpringApplication.run(BaselineApplication.class, args);
    }
}
