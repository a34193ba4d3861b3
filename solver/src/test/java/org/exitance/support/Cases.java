package org.exitance.support;

import java.util.ArrayList;
import java.util.List;
import org.exitance.model.BandSet;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.model.SolverSettings;

/** Small helpers to build models in tests. */
public final class Cases {
    private Cases() {
    }

    public static RadiationCase of(Enclosure e, BandSet bands) {
        List<Material> mats = new ArrayList<>();
        for (EnclosureSurface s : e.surfaces()) {
            if (!mats.contains(s.material())) {
                mats.add(s.material());
            }
        }
        return new RadiationCase("test", "", mats, e, bands, SolverSettings.DEFAULT);
    }
}
