package org.exitance.thermal;

import org.ejml.data.DMatrixRMaj;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;

/**
 * Checks that a temperature solve is posed: something fixes the temperature level, every
 * unknown-temperature node emits in some band, and every unknown temperature moves some heat
 * balance. Each failure is an {@link IllPosedCaseException} naming the surface.
 */
final class Posedness {
    private Posedness() {
    }

    /**
     * Rejects an enclosure whose temperature level nothing fixes: every temperature unknown, no
     * environment, and no surface that convects (on an energy-balance condition) to a fluid.
     *
     * @throws IllPosedCaseException when that is so
     */
    static void requireAnchor(Enclosure enc) {
        boolean anchored = enc.environment() != null || enc.surfaces().stream().anyMatch(s ->
                s.boundary() instanceof BoundaryCondition.FixedTemperature
                        || s.boundary().balancesAllPaths() && s.convectionConductanceWPerK() > 0)
                || enc.walls().entrySet().stream().anyMatch(w -> !(w.getValue().outside()
                        instanceof org.exitance.conduction.OuterBoundary.Insulated)
                        && enc.surface(enc.indexOf(w.getKey())).boundary().balancesAllPaths());
        if (!anchored) {
            throw new IllPosedCaseException("no surface has a fixed temperature, none convects to a fluid and"
                    + " there is no environment (nor a wall open to the outside): the temperature level is undetermined; fix at least one"
                    + " surface's temperature");
        }
    }

    /**
     * An unknown-temperature surface that emits in no band has no defined temperature.
     *
     * @param eps  band-mean ε, [band][surface]; not modified
     */
    static void requireEmission(Problem p, double[][] eps) {
        for (int a = 0; a < p.unknown.length; a++) {
            int u = p.unknown[a];
            boolean emits = false;
            for (double[] band : eps) {
                for (int i : p.faces[a]) {
                    emits |= band[i] > 0;
                }
            }
            if (!emits) {
                throw new IllPosedCaseException("surface '" + p.enc.surface(u).name() + "' has zero emissivity in every"
                        + " band, so its temperature is undefined; give it a temperature or a nonzero emissivity");
            }
        }
    }

    /** Rejects a Jacobian with a zero column: that node's temperature moves no heat balance. */
    static void requireLiveColumns(Problem p, DMatrixRMaj jac) {
        for (int a = 0; a < p.unknown.length; a++) {
            boolean zero = true;
            for (int b = 0; b < p.unknown.length; b++) {
                zero &= jac.get(b, a) == 0;
            }
            if (zero) {
                throw new IllPosedCaseException("the temperature of surface '" + p.enc.surface(p.unknown[a]).name()
                        + "' does not affect any heat balance (zero emissivity in every band?): it is undefined");
            }
        }
    }

    /** The error for a Jacobian that LU cannot factor or whose step is not finite. */
    static IllPosedCaseException singular() {
        return new IllPosedCaseException("the heat balances do not determine the unknown temperatures"
                + " (singular Jacobian)");
    }
}
