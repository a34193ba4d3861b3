package org.exitance.cases;

import java.util.List;
import java.util.Locale;

/**
 * The one place that holds the range of every number a case can hold (docs/case-format.md,
 * "Limits", lists the same table). The ranges are generous for engineering work and keep every
 * later computation inside the range of double precision: σT⁴ at the highest temperature, view
 * factors of the smallest facet at the largest distance, and the products of conductances and
 * areas that the Newton solve forms. A value outside its range is an input error (exit 2) naming
 * the file, the JSON path and the range, before any work is done.
 */
public final class Limits {

    /**
     * A closed range [min, max] of a quantity in the unit its keys carry.
     *
     * @param quantity what the range bounds, for docs and messages ("temperature")
     * @param min      least value allowed
     * @param max      largest value allowed
     * @param unit     the unit of the keys ("K", "m²"), "" for a pure number
     */
    public record Range(String quantity, double min, double max, String unit) {
        public boolean contains(double v) {
            return v >= min && v <= max;
        }

        /** "between 0.01 K and 10000 K". */
        public String describe() {
            return "between " + number(min) + unitSuffix() + " and " + number(max) + unitSuffix();
        }

        private String unitSuffix() {
            return unit.isEmpty() ? "" : " " + unit;
        }
    }

    /** Surface, fluid, starting and table temperatures (K). An environment may be at 0 K. */
    public static final Range TEMPERATURE_K = new Range("temperature", 0.01, 10_000, "K");
    /** The temperature of the environment (K): 0 K is a perfect sink (deep space). */
    public static final Range ENVIRONMENT_TEMPERATURE_K = new Range("environment temperature", 0, 10_000, "K");
    /** The temperature of a blackbody source (K): up to hot stars. */
    public static final Range SOURCE_TEMPERATURE_K = new Range("source temperature", 1, 100_000, "K");
    /** Surface areas (m²): a square micrometre to a million square kilometres. */
    public static final Range AREA_M2 = new Range("area", 1e-12, 1e12, "m²");
    /** Coordinates of points (m): within a thousand kilometres of the origin. */
    public static final Range COORDINATE_M = new Range("coordinate", -1e6, 1e6, "m");
    /** Sizes of shapes: radii, heights, edge lengths (m). */
    public static final Range LENGTH_M = new Range("length", 1e-6, 1e6, "m");
    /** A radius that may be zero: the inner radius of an annulus, the ends of a cone (m). */
    public static final Range RADIUS_OR_ZERO_M = new Range("radius", 0, 1e6, "m");
    /** The length of a direction vector (a normal, an axis), which need not be a unit vector. */
    public static final Range DIRECTION_LENGTH = new Range("length of a direction", 1e-6, 1e6, "");
    /** Rotation angles (degrees). */
    public static final Range ANGLE_DEG = new Range("angle", -360, 360, "°");
    /** The scale of a mesh file's coordinates (metres per file unit). */
    public static final Range MESH_SCALE_M = new Range("mesh scale", 1e-9, 1e6, "m");
    /** A planet's radius (m): from a boulder to the Sun. */
    public static final Range PLANET_RADIUS_M = new Range("planet radius", 1, 1e9, "m");
    /** Altitude above a planet (m). */
    public static final Range ALTITUDE_M = new Range("altitude", 1, 1e12, "m");
    /** Wavelengths of tables, band edges and spectra (µm): X-rays to microwaves. */
    public static final Range WAVELENGTH_UM = new Range("wavelength", 1e-3, 1e5, "µm");
    /** Conductance of a conductive link (W/K). */
    public static final Range CONDUCTANCE_W_K = new Range("conductance", 1e-6, 1e8, "W/K");
    /** Convection coefficient (W/(m²·K)): still air to boiling. */
    public static final Range CONVECTION_W_M2K = new Range("convection coefficient", 0, 1e6, "W/(m²·K)");
    /** Irradiance of a source (W/m²): up to 10⁵ suns of concentration. */
    public static final Range IRRADIANCE_W_M2 = new Range("irradiance", 0, 1e8, "W/m²");
    /** Spectral irradiance of a tabulated source (W/(m²·µm)). */
    public static final Range SPECTRAL_IRRADIANCE_W_M2_UM = new Range("spectral irradiance", 0, 1e9, "W/(m²·µm)");
    /** A given net heat or dissipation of one surface (W), either sign. */
    public static final Range HEAT_W = new Range("heat", -1e12, 1e12, "W");
    /** A given net flux of one surface (W/m²), either sign. */
    public static final Range FLUX_W_M2 = new Range("heat flux", -1e9, 1e9, "W/m²");
    /** Emissivity, reflectivity, transmissivity, incidence factors, view factors, uncertainty bounds. */
    public static final Range FRACTION = new Range("fraction", 0, 1, "");
    /** Newton's temperature-step tolerance (K). */
    public static final Range TEMPERATURE_TOLERANCE_K = new Range("temperature tolerance", 1e-12, 10, "K");
    /** Newton's relative heat tolerance. */
    public static final Range RELATIVE_HEAT_TOLERANCE = new Range("relative heat tolerance", 1e-15, 0.1, "");
    /** Tolerances of a given view-factor matrix (row sums, reciprocity). */
    public static final Range MATRIX_TOLERANCE = new Range("view-factor tolerance", 1e-15, 1, "");
    /** The relative accuracy asked of each facet pair's view factor. */
    public static final Range PAIR_TOLERANCE = new Range("pair tolerance", 1e-12, 0.5, "");
    /** Target of the facet rows of a geometry's view factors. */
    public static final Range VIEW_FACTOR_TOLERANCE = new Range("view-factor tolerance", 1e-10, 0.1, "");
    /** Newton iterations per property update. */
    public static final Range NEWTON_ITERATIONS = new Range("Newton iterations", 1, 10_000, "");
    /** Outer updates of temperature-dependent properties. */
    public static final Range PROPERTY_ITERATIONS = new Range("property iterations", 1, 1_000, "");
    /** Quadrature order of visibility sampling. */
    public static final Range VISIBILITY_ORDER = new Range("visibility order", 1, 16, "");
    /** Worker threads for view factors (0: all cores). */
    public static final Range THREADS = new Range("threads", 0, 1024, "");
    /** Each division count of a shape. */
    public static final Range DIVISIONS = new Range("divisions", 1, 10_000, "");
    /** Facets of a whole geometry (every part, both sides of two-sided parts). */
    public static final Range FACETS = new Range("facets", 1, 100_000, "");
    /** Band edges a case gives. */
    public static final Range BAND_EDGES = new Range("band edges", 0, 1_000, "");
    /** Points of one table (emissivity, spectrum) and vertices of one polygon. */
    public static final Range TABLE_POINTS = new Range("table points", 1, 100_000, "");
    /** Size of a case file, a mesh file or a CSV file (bytes). */
    public static final Range FILE_BYTES = new Range("file size", 0, 256L * 1024 * 1024, "bytes");

    /** Heat capacity of a node (J/K). */
    public static final Range HEAT_CAPACITY_J_K = new Range("heat capacity", 1e-6, 1e12, "J/K");
    /** Mass of a node (kg). */
    public static final Range MASS_KG = new Range("mass", 1e-9, 1e9, "kg");
    /** Specific heat of a node or a wall layer (J/(kg·K)). */
    public static final Range SPECIFIC_HEAT_J_KGK = new Range("specific heat", 1e-3, 1e7, "J/(kg·K)");
    /** Thermal conductivity of a wall layer (W/(m·K)). */
    public static final Range CONDUCTIVITY_W_MK = new Range("thermal conductivity", 1e-5, 1e4, "W/(m·K)");
    /** Density of a wall layer (kg/m³). */
    public static final Range DENSITY_KG_M3 = new Range("density", 1e-3, 1e5, "kg/m³");
    /** Thickness of a wall layer (m). */
    public static final Range THICKNESS_M = new Range("layer thickness", 1e-6, 100, "m");
    /** Finite-volume cells of one wall layer. */
    public static final Range WALL_CELLS = new Range("wall cells", 1, 400, "");
    /** Layers of one wall. */
    public static final Range WALL_LAYERS = new Range("wall layers", 1, 100, "");
    /** Duration of a transient, and its period (s). */
    public static final Range DURATION_S = new Range("duration", 1e-3, 1e10, "s");
    /** Instants of schedules and outputs (s). */
    public static final Range TIME_S = new Range("time", 0, 1e10, "s");
    /** Time steps and output spacing (s). */
    public static final Range STEP_S = new Range("time step", 1e-12, 1e10, "s");
    /** The local error per step and the repeat tolerance of a periodic run (K). */
    public static final Range STEP_TOLERANCE_K = new Range("step tolerance", 1e-8, 100, "K");
    /** Periods of a periodic run. */
    public static final Range CYCLES = new Range("cycles", 1, 10_000, "");
    /** The factor on a source's irradiance in a schedule. */
    public static final Range SOURCE_SCALE = new Range("source scale", 0, 1000, "");

    /** Every range, in the order of the table in docs/case-format.md. */
    /** Layers of one insulation blanket or shield pack. */
    public static final Range COVER_LAYERS = new Range("cover layers", 1, 500, "");

    public static final List<Range> ALL = List.of(TEMPERATURE_K, ENVIRONMENT_TEMPERATURE_K, SOURCE_TEMPERATURE_K,
            AREA_M2, COORDINATE_M, LENGTH_M, RADIUS_OR_ZERO_M, DIRECTION_LENGTH, ANGLE_DEG, MESH_SCALE_M,
            PLANET_RADIUS_M, ALTITUDE_M, WAVELENGTH_UM, CONDUCTANCE_W_K, CONVECTION_W_M2K, IRRADIANCE_W_M2,
            SPECTRAL_IRRADIANCE_W_M2_UM, HEAT_W, FLUX_W_M2, FRACTION, TEMPERATURE_TOLERANCE_K,
            RELATIVE_HEAT_TOLERANCE, MATRIX_TOLERANCE, PAIR_TOLERANCE, VIEW_FACTOR_TOLERANCE, NEWTON_ITERATIONS, PROPERTY_ITERATIONS,
            VISIBILITY_ORDER, THREADS, DIVISIONS, FACETS, BAND_EDGES, TABLE_POINTS, FILE_BYTES, COVER_LAYERS,
            HEAT_CAPACITY_J_K, MASS_KG, SPECIFIC_HEAT_J_KGK, CONDUCTIVITY_W_MK, DENSITY_KG_M3, THICKNESS_M, WALL_CELLS,
            WALL_LAYERS, DURATION_S, TIME_S, STEP_S, STEP_TOLERANCE_K, CYCLES, SOURCE_SCALE);

    private Limits() {
    }

    /** A limit in a message: integers as integers, others with up to six significant digits. */
    public static String number(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e6) {
            return Long.toString((long) v);
        }
        String s = String.format(Locale.ROOT, "%.6g", v);
        if (s.contains("e")) {
            String[] p = s.split("e");
            return p[0].replaceAll("\\.?0+$", "") + "e" + Integer.parseInt(p[1]);
        }
        return s.contains(".") ? s.replaceAll("\\.?0+$", "") : s;
    }
}
