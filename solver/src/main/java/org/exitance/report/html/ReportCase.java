package org.exitance.report.html;

import java.util.List;
import java.util.Map;
import org.exitance.geometry.Scene;
import org.exitance.model.Material;
import org.exitance.spectral.source.IrradiationSource;

/**
 * What the report says about the case itself, gathered by the command that writes it.
 *
 * @param file        the case file as the user named it
 * @param title       its title ("" if none)
 * @param notes       its notes ("" if none)
 * @param materials   the case's materials, in file order
 * @param materialOf  surface name → material name, for the case's surfaces (as in the case file)
 * @param sources     the spectra of the case's external sources (empty for none)
 * @param environmentK the environment's temperature (K), or NaN for a closed enclosure
 * @param scene       the case's geometry, or null for a case that gives its view factors as a matrix
 * @param facts       further lines for the summary (e.g. how accurate the view factors are)
 * @param warnings    the warnings of reading and solving, one line each
 */
public record ReportCase(String file, String title, String notes, List<Material> materials,
                         Map<String, String> materialOf, List<IrradiationSource> sources, double environmentK,
                         Scene scene, List<String> facts, List<String> warnings) {
    public ReportCase {
        materials = List.copyOf(materials);
        materialOf = Map.copyOf(materialOf);
        sources = List.copyOf(sources);
        facts = List.copyOf(facts);
        warnings = List.copyOf(warnings);
    }
}
