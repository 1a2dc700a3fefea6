package utdigit;

import org.springframework.boot.SpringApplication;
import org.springframework.boot.autoconfigure.SpringBootApplication;

/** Entry point of the UT digitization calculation service. */
@SpringBootApplication
public class UtDigitizationApplication {

    public static void main(String[] args) {
        SpringApplication.run(UtDigitizationApplication.class, args);
    }
}
