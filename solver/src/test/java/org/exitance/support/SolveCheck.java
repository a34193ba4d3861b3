package org.exitance.support;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.ConductiveLink;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.LoadCase;
import org.exitance.model.RadiationCase;
import org.exitance.result.LoadCaseResult;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;

/**
 * Checks that a reported solve is a solution of its own equations, with nothing from the
 * program's solve path (network, bands, thermal): the band radiosity equations of diffuse
 * surfaces (Siegel &amp; Howell, Thermal Radiation Heat Transfer, 5th ed., §6.3; Modest, Radiative
 * Heat Transfer, 3rd ed., §5.3, band form §5.7), with windows as two faces joined by τ
 * (Siegel &amp; Howell, 5th ed., partially transparent windows, from memory):
 *
 * <pre>
 *   J_i = ε_i E_i + ρ_i (FJ)_i + τ_i (FJ)_o(i) + R_i,   ρ_i = 1 − ε_i − τ_i
 *   G_i = (FJ)_i + H_i,   q_i = J_i − G_i
 * </pre>
 *
 * Band means ε, τ, E and the external terms come from {@link SpectralReference}; H holds the
 * environment (a black surface at T_env seen with F_i,env = 1 − Σ_j F_ij, common practice) and the
 * sources, each absorbed with α Planck- or spectrum-weighted by what it sends (Kirchhoff: α_λ = ε_λ)
 * or, for the gray shortcut, with α = ε; R is what of H leaves face i unabsorbed: reflected,
 * or transmitted from the other face. The linear system is solved here with Commons Math LU.
 *
 * <p>Reported values are read from {@link SolveResult#facets()} when the case was solved on facets.
 * Nothing passed in is modified.
 */
public final class SolveCheck {
    /** Default relative tolerance of {@link #assertSolved}: of the solve's power scale. */
    public static final double TOLERANCE = 1e-9;

    private SolveCheck() {
    }

    /** The independent solution at the reported temperatures, [band][surface] in case order. */
    public record Reference(List<String> names, double[][] emissivity, double[][] radiosityWPerM2,
                            double[][] incidentW, double[][] netHeatW, double scaleW) {
    }

    /**
     * Largest |A_i r_ik| (W) over bands and surfaces of the reported J and G: r = J − εE − ρ FJ −
     * τ (FJ)_o − R for the radiosity equation and G − FJ − H for the irradiation.
     */
    public static double residualW(RadiationCase c, SolveResult r) {
        return residualW(c, r, false);
    }

    /** As {@link #residualW(RadiationCase, SolveResult)}; {@code ownEmissivity}: external α = ε (gray shortcut). */
    public static double residualW(RadiationCase c, SolveResult r, boolean ownEmissivity) {
        Bands b = new Bands(c, r, ownEmissivity);
        List<SurfaceResult> rep = reported(c, r);
        double worst = 0;
        for (int k = 0; k < b.nb; k++) {
            double[] j = new double[b.n];
            for (int i = 0; i < b.n; i++) {
                j[i] = rep.get(i).bandRadiosityWPerM2()[k];
            }
            double[] fj = b.times(j);
            for (int i = 0; i < b.n; i++) {
                int o = b.other[i];
                double tauPart = o >= 0 ? b.tau[k][i] * fj[o] : 0.0;
                double rJ = j[i] - b.eps[k][i] * b.e[k][i] - b.rho(k, i) * fj[i] - tauPart - b.leaving[k][i];
                double rG = rep.get(i).bandIncidentW()[k] - b.area[i] * (fj[i] + b.h[k][i]);
                worst = Math.max(worst, Math.max(Math.abs(b.area[i] * rJ), Math.abs(rG)));
            }
        }
        return worst;
    }

    /** The power scale a residual is measured against: Σ_k Σ_i A_i (J + εE + H) of the reference (W). */
    public static double scaleW(RadiationCase c, SolveResult r) {
        return reference(c, r, false).scaleW();
    }

    /** The textbook system solved at the reported temperatures. */
    public static Reference reference(RadiationCase c, SolveResult r, boolean ownEmissivity) {
        Bands b = new Bands(c, r, ownEmissivity);
        double[][] j = new double[b.nb][];
        double[][] g = new double[b.nb][b.n];
        double[][] q = new double[b.nb][b.n];
        double scale = 0;
        for (int k = 0; k < b.nb; k++) {
            RealMatrix a = new Array2DRowRealMatrix(b.n, b.n);
            double[] rhs = new double[b.n];
            for (int i = 0; i < b.n; i++) {
                a.addToEntry(i, i, 1.0);
                for (int m = 0; m < b.n; m++) {
                    a.addToEntry(i, m, -b.rho(k, i) * b.f[i][m]);
                    if (b.other[i] >= 0) {
                        a.addToEntry(i, m, -b.tau[k][i] * b.f[b.other[i]][m]);
                    }
                }
                rhs[i] = b.eps[k][i] * b.e[k][i] + b.leaving[k][i];
            }
            j[k] = new LUDecomposition(a).getSolver().solve(new ArrayRealVector(rhs, false)).toArray();
            double[] fj = b.times(j[k]);
            for (int i = 0; i < b.n; i++) {
                g[k][i] = b.area[i] * (fj[i] + b.h[k][i]);
                // q = J − G in the form without cancellation as ε → 0: J − G = εE − (ε+τ)FJ + τ(FJ)_o − (H − R)
                double fromOther = b.other[i] >= 0 ? b.tau[k][i] * fj[b.other[i]] : 0.0;
                q[k][i] = b.area[i] * (b.eps[k][i] * b.e[k][i] - (b.eps[k][i] + b.tau[k][i]) * fj[i] + fromOther
                        - (b.h[k][i] - b.leaving[k][i]));
                scale += b.area[i] * (Math.abs(j[k][i]) + b.eps[k][i] * b.e[k][i] + b.h[k][i]);
            }
        }
        return new Reference(b.names, b.eps, j, g, q, scale);
    }

    /**
     * Asserts that the reported solve is the solution: the residual of its equations, its J, A·G,
     * band net heats and band ε against the independent solve, and every unknown temperature's
     * condition (radiation, plus convection and links where the condition balances all paths)
     * met by the independent heats; each within {@code relTol} of the power scale.
     */
    public static void assertSolved(RadiationCase c, SolveResult r, double relTol, boolean ownEmissivity) {
        Reference ref = reference(c, r, ownEmissivity);
        double tol = relTol * ref.scaleW();
        double res = residualW(c, r, ownEmissivity);
        if (!(res <= tol)) {
            throw new AssertionError("radiosity residual " + res + " W exceeds " + tol + " W");
        }
        List<SurfaceResult> rep = reported(c, r);
        Enclosure enc = c.enclosure();
        for (int i = 0; i < enc.size(); i++) {
            SurfaceResult s = rep.get(i);
            double area = enc.surface(i).areaM2();
            for (int k = 0; k < ref.emissivity().length; k++) {
                near(s.name(), k, "A·J", area * s.bandRadiosityWPerM2()[k], area * ref.radiosityWPerM2()[k][i], tol);
                near(s.name(), k, "A·G", s.bandIncidentW()[k], ref.incidentW()[k][i], tol);
                near(s.name(), k, "band net heat", s.bandNetHeatW()[k], ref.netHeatW()[k][i], tol);
                near(s.name(), k, "band ε", s.bandEmissivity()[k], ref.emissivity()[k][i], relTol);
            }
        }
        double cond = conditionResidualW(c, r, ref);
        if (!(cond <= tol)) {
            throw new AssertionError("an unknown temperature misses its condition by " + cond + " W (allowed " + tol + ")");
        }
    }

    /** {@link #assertSolved(RadiationCase, SolveResult, double, boolean)} at {@link #TOLERANCE}, α from the spectra. */
    public static void assertSolved(RadiationCase c, SolveResult r) {
        assertSolved(c, r, TOLERANCE, false);
    }

    /** The case a load-case result was solved for (the load case applied), or the case itself. */
    public static RadiationCase caseOf(RadiationCase c, LoadCaseResult lc) {
        for (LoadCase l : c.loadCases()) {
            if (l.name().equals(lc.name())) {
                return l.applyTo(c);
            }
        }
        return c;
    }

    /**
     * Largest miss (W) of any unknown temperature's condition, with the reference radiative heats
     * at the reported temperatures, beyond the rounding floor of its link heats.
     */
    public static double conditionResidualW(RadiationCase c, SolveResult r, Reference ref) {
        Enclosure enc = c.enclosure();
        List<SurfaceResult> rep = reported(c, r);
        double worst = 0;
        for (int i = 0; i < enc.size(); i++) {
            EnclosureSurface s = enc.surface(i);
            BoundaryCondition bc = s.boundary();
            if (!bc.temperatureUnknown()) {
                continue;
            }
            List<Integer> faces = new ArrayList<>(List.of(i));
            if (s.otherFace() != null) {
                faces.add(enc.indexOf(s.otherFace()));
            }
            double achieved = 0;
            double floor = 0;
            for (int f : faces) {
                EnclosureSurface face = enc.surface(f);
                double t = rep.get(f).temperatureK();
                for (double[] band : ref.netHeatW()) {
                    achieved += band[f];
                }
                if (bc.balancesAllPaths()) {
                    // a wall's heat is taken as reported: its conduction is checked on its own against
                    // closed forms (thermal.LayeredWallSteadyTest); here the node balance that includes it
                    achieved += rep.get(f).wallW();
                    if (face.convection() != null) {
                        achieved += face.convection().coefficientWPerM2K() * face.areaM2()
                                * (t - face.convection().fluidTemperatureK());
                    }
                    for (ConductiveLink l : enc.links()) {
                        String to = l.surfaceA().equals(face.name()) ? l.surfaceB()
                                : l.surfaceB().equals(face.name()) ? l.surfaceA() : null;
                        if (to != null) {
                            double tj = rep.get(enc.indexOf(to)).temperatureK();
                            achieved += l.conductanceWPerK() * (t - tj);
                            floor += 64 * Math.ulp(l.conductanceWPerK() * (t + tj));
                        }
                    }
                }
            }
            worst = Math.max(worst, Math.max(0, Math.abs(achieved - bc.targetNetHeatW(s.areaM2())) - floor));
        }
        return worst;
    }

    private static void near(String name, int k, String what, double reported, double reference, double tol) {
        if (!(Math.abs(reported - reference) <= tol)) {
            throw new AssertionError(name + " band " + k + " " + what + ": reported " + reported + ", independent "
                    + reference + ", allowed ±" + tol);
        }
    }

    /** The reported results in case order: facets when the case was solved on facets. */
    static List<SurfaceResult> reported(RadiationCase c, SolveResult r) {
        Map<String, SurfaceResult> all = new HashMap<>();
        for (SurfaceResult s : r.facets().isEmpty() ? r.surfaces() : r.facets()) {
            all.put(s.name(), s);
        }
        List<SurfaceResult> out = new ArrayList<>();
        for (EnclosureSurface s : c.enclosure().surfaces()) {
            SurfaceResult x = all.get(s.name());
            if (x == null) {
                throw new AssertionError("no result for surface '" + s.name() + "'");
            }
            out.add(x);
        }
        return out;
    }
}
