package utdigit.core.waveform;

import org.junit.jupiter.api.Test;
import utdigit.core.pulse.GaussianPulse;
import utdigit.core.sampling.PeakReading;
import utdigit.core.sampling.PulseSamplingLoss;

class ScratchTest {
    @Test
    void print() {
        GaussianPulse g = GaussianPulse.of(5.0, 0.6);
        double fs = 100.0;
        int n = 512;
        double[] x = new double[n];
        for (int i = 0; i < n; i++) x[i] = g.amplitude((i - 256.3) / fs);
        long t0 = System.nanoTime();
        WaveformResult r = WaveformAnalyzer.analyse(WaveformInput.of(x, fs).withTarget(25.0, null, null, null, 1.0));
        System.out.println("ms " + (System.nanoTime() - t0) / 1e6);
        System.out.println(r.peakFrequencyMhz() + " " + r.lowerFrequencyMhz() + " " + r.upperFrequencyMhz() + " " + r.centreFrequencyMhz() + " " + r.bandwidthPercent());
        System.out.println(r.lowerFrequency20dbMhz() + " " + r.upperFrequency20dbMhz() + " model20 " + g.lowerEdgeMhz(20) + " " + g.upperEdgeMhz(20));
        System.out.println(r.pulseDuration6dbUs() + " model " + g.envelopeDurationUs(6) + " " + r.pulseDuration20dbUs() + " model " + g.envelopeDurationUs(20));
        System.out.println(r.target());
        System.out.println("model loss " + PulseSamplingLoss.rfLossDb(g, 1 / 25.0, PeakReading.ABSOLUTE));
        r.warnings().forEach(System.out::println);
    }
}
