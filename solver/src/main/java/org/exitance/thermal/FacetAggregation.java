package org.exitance.thermal;

import java.util.ArrayList;
import java.util.List;
import org.exitance.model.FacetGroups;
import org.exitance.result.PairExchange;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;

/**
 * Reports a solve on facets by surface: heats, band heats and incident powers add; the
 * temperature is the area-weighted mean of the facets' (min and max stay available in the facet
 * detail); band emissivities and band radiosities are area-weighted means; the pair exchange
 * adds over the facets of each pair of surfaces ({@link PairExchange#grouped}). The facets' own results are kept in
 * {@link SolveResult#facets()}.
 */
final class FacetAggregation {
    private FacetAggregation() {
    }

    /**
     * @param keepFacetExchange  also keep the facets' pair exchange (when one was computed) as
     *                           {@link SolveResult#facetPairExchange()}
     */
    static SolveResult bySurface(SolveResult r, FacetGroups groups, boolean keepFacetExchange) {
        List<SurfaceResult> out = new ArrayList<>();
        int nb = r.bands().size();
        for (String surface : groups.surfaces()) {
            double area = 0;
            double q = 0;
            double conv = 0;
            double cond = 0;
            double wall = 0;
            double supplied = 0;
            double at = 0;
            double[] bandQ = new double[nb];
            double[] bandEps = new double[nb];
            double[] bandG = new double[nb];
            double[] bandJ = new double[nb];
            boolean solved = false;
            String label = "";
            for (String facet : groups.facetsBySurface().get(surface)) {
                SurfaceResult f = r.surface(facet);
                area += f.areaM2();
                q += f.netHeatW();
                conv += f.convectionW();
                cond += f.conductionW();
                wall += f.wallW();
                supplied += f.heatSuppliedW();
                at += f.areaM2() * f.temperatureK();
                solved |= f.temperatureSolved();
                label = f.boundary();
                for (int k = 0; k < nb; k++) {
                    bandQ[k] += f.bandNetHeatW()[k];
                    bandEps[k] += f.areaM2() * f.bandEmissivity()[k];
                    bandG[k] += f.bandIncidentW()[k];
                    bandJ[k] += f.areaM2() * f.bandRadiosityWPerM2()[k];
                }
            }
            for (int k = 0; k < nb; k++) {
                bandEps[k] /= area;
                bandJ[k] /= area;
            }
            out.add(new SurfaceResult(surface, area, label + " per facet", at / area, solved, q, q / area, bandQ, bandEps,
                    conv, cond, wall, supplied, bandG, bandJ));
        }
        PairExchange facetPairs = r.pairExchange().orElse(null);
        return r.toBuilder().surfaces(out).facets(r.surfaces())
                .pairExchange(facetPairs == null ? null : facetPairs.grouped(groups.facetsBySurface()))
                .facetPairExchange(keepFacetExchange ? facetPairs : null).build();
    }
}
