package org.exitance.thermal;

import java.util.ArrayList;
import java.util.List;
import org.exitance.bands.BandLoop;
import org.exitance.bands.ExternalIrradiation;
import org.exitance.model.Band;
import org.exitance.model.BandSet;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.ExternalSource;
import org.exitance.model.RadiationCase;
import org.exitance.network.BandState;
import org.exitance.result.EnvironmentResult;
import org.exitance.result.SolveResult;
import org.exitance.result.SolverReport;
import org.exitance.result.SourceResult;
import org.exitance.result.SurfaceResult;
import org.exitance.result.FacePairResult;
import org.exitance.spectral.PhysicalConstants;
import org.exitance.spectral.Planck;
import org.exitance.spectral.SpectralEmissivity;

/**
 * Turns the converged state of a solve into the immutable {@link SolveResult}: per-surface
 * heats by band and path, the environment's and the sources' powers, windows, and the energy
 * balance Σ_i Q_i + Q_env + P_ext, which is zero for an exact, reciprocal network.
 */
final class ResultAssembler {
    private static final double SIGMA = PhysicalConstants.STEFAN_BOLTZMANN_W_M2_K4;
    private final RadiationCase radiationCase;
    private final String linearName;

    ResultAssembler(RadiationCase radiationCase, String linearName) {
        this.radiationCase = radiationCase;
        this.linearName = linearName;
    }

    /**
     * Incident and first-absorbed power of every source at the solved temperatures, with each
     * surface's band absorptivity for the source's own spectrum as the band loop computed it.
     */
    private List<SourceResult> sourceResults(Problem p, BandLoop loop) {
        List<SourceResult> out = new ArrayList<>();
        List<ExternalSource> sources = radiationCase.sources();
        for (int s = 0; s < sources.size(); s++) {
            ExternalSource src = sources.get(s);
            double incident = 0;
            double absorbed = 0;
            for (int i = 0; i < p.area.length; i++) {
                double w = p.area[i] * src.irradianceOn(p.enc.surface(i).name());
                if (w == 0) {
                    continue;
                }
                incident += w;
                for (int k = 0; k < loop.bands().size(); k++) {
                    ExternalIrradiation x = loop.external(k);
                    absorbed += w * x.sourceFraction()[s] * x.sourceAbsorptivity()[s][i];
                }
            }
            out.add(new SourceResult(src.name(), src.spectrum().label(), incident, absorbed));
        }
        return out;
    }

    /** Power arriving from external sources on all surfaces (W), all bands. */
    double externalPowerW(Problem p) {
        double w = 0;
        for (ExternalSource src : radiationCase.sources()) {
            for (int i = 0; i < p.area.length; i++) {
                w += p.area[i] * src.irradianceOn(p.enc.surface(i).name());
            }
        }
        return w;
    }

    /** Net power leaving the environment into the enclosure in one band (W). */
    private static double environmentNetHeatW(Problem p, ExternalIrradiation x, BandState s) {
        if (p.enc.environment() == null) {
            return 0.0;
        }
        double envE = x.environmentPower();
        double q = 0;
        for (int i = 0; i < p.area.length; i++) {
            q += p.area[i] * p.envFactor[i] * (envE - s.radiosity()[i]);
        }
        return q;
    }

    /**
     * @param loop    the band loop at the converged temperatures
     * @param states  its solved band states at t
     * @param t       converged temperatures (K); none of the arrays is modified
     */
    SolveResult assemble(Problem p, BandSet bandSet, BandLoop loop, BandState[] states, double[] t,
                         Counters counters) {
        List<Band> bands = loop.bands();
        double[][] eps = loop.emissivity();
        Enclosure enc = p.enc;
        int n = enc.size();
        int nb = bands.size();
        List<SurfaceResult> out = new ArrayList<>(n);
        double total = 0;
        double scale = 0;
        double[] extra = new double[2];
        for (int i = 0; i < n; i++) {
            EnclosureSurface s = enc.surface(i);
            EnclosureSurface carrier = enc.surface(p.primary[i]);
            double[] bandQ = new double[nb];
            double[] bandEps = new double[nb];
            double q = 0;
            for (int k = 0; k < nb; k++) {
                bandQ[k] = p.area[i] * states[k].netFlux()[i];
                bandEps[k] = eps[k][i];
                q += bandQ[k];
                scale += p.area[i] * Math.abs(states[k].radiosity()[i]);
            }
            total += q;
            double conv = p.convectionW(i, t[i]);
            double cond = p.conductionW(i, t);
            p.paths.heat(i, t[i], extra);
            double wall = extra[0];
            String kind = s.isWindowFace() ? "window" : "two-sided";
            String label = !s.hasOtherFace() ? s.boundary().label()
                    : carrier != s ? kind + " face" : s.boundary().label() + " (" + kind + ")";
            double[] bandG = new double[nb];
            double[] bandJ = new double[nb];
            for (int k = 0; k < nb; k++) {
                bandG[k] = p.area[i] * states[k].irradiation()[i];
                bandJ[k] = states[k].radiosity()[i];
            }
            out.add(new SurfaceResult(s.name(), s.areaM2(), label, t[i],
                    carrier.boundary().temperatureUnknown(), q, q / s.areaM2(), bandQ, bandEps, conv, cond, wall,
                    q + conv + cond + wall,
                    bandG, bandJ));
        }
        double external = externalPowerW(p);
        total += external;
        scale += external;
        EnvironmentResult env = null;
        if (enc.environment() != null) {
            double[] bandQ = new double[nb];
            double q = 0;
            for (int k = 0; k < nb; k++) {
                bandQ[k] = environmentNetHeatW(p, loop.external(k), states[k]);
                q += bandQ[k];
            }
            for (int i = 0; i < n; i++) {
                scale += p.area[i] * p.envFactor[i] * SIGMA * Math.pow(p.envT, 4);
            }
            total += q;
            env = new EnvironmentResult(enc.environment().name(), p.envT, q, bandQ);
        }
        double residual = 0;
        for (int a = 0; a < p.unknown.length; a++) {
            double achieved = 0;
            for (int i : p.faces[a]) {
                SurfaceResult sr = out.get(i);
                achieved += p.allPaths[a] ? sr.heatSuppliedW() : sr.netHeatW();
            }
            residual = Math.max(residual, Math.abs(achieved - p.target[a]));
        }
        List<FacePairResult> windows = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (p.other[i] >= 0 && p.primary[i] == i) {
                SurfaceResult a = out.get(i);
                SurfaceResult b = out.get(p.other[i]);
                windows.add(new FacePairResult(a.name(), b.name(), enc.surface(i).isWindowFace(), t[i],
                        a.netHeatW() + b.netHeatW(),
                        a.heatSuppliedW() + b.heatSuppliedW()));
            }
        }
        SolverReport report = new SolverReport(linearName, counters.newtonIterations, counters.propertyIterations,
                residual, p.unknown.length == 0 ? 0 : counters.lastStep, counters.maxLinearIterations,
                counters.maxLinearResidual);
        return SolveResult.builder().title(radiationCase.title()).bands(bands).bandOrigin(bandSet.origin())
                .surfaces(out).environment(env).energyBalanceW(total).energyScaleW(scale).solver(report)
                .sources(sourceResults(p, loop)).facePairs(windows).build();
    }
}
