package utdigit.web.common;

import utdigit.core.materials.WaveMode;

/**
 * The velocity inputs shared by every request that needs a sound velocity: exactly one of
 * velocity_m_per_s, velocity_in_per_us or material (with wave_mode, and temperature_c for water).
 */
public interface VelocityFields {
    Double velocityMPerS();

    Double velocityInPerUs();

    String material();

    WaveMode waveMode();

    Double temperatureC();
}
