package org.clearance.survey;

import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import org.locationtech.proj4j.CRSFactory;
import org.locationtech.proj4j.CoordinateReferenceSystem;
import org.locationtech.proj4j.proj.LongLatProjection;
import org.locationtech.proj4j.units.Unit;

/**
 * Looks up the linear unit of a projected CRS by its EPSG code in proj4j's copy of the EPSG
 * database ({@code new CRSFactory().createFromName("EPSG:n")}, projection units).
 */
final class EpsgUnits {
  /** What the database says about one code. */
  record Lookup(Optional<LinearUnit> unit, boolean geographic, String note) {}

  private static final Map<Integer, Lookup> CACHE = new ConcurrentHashMap<>();

  private EpsgUnits() {}

  /** The unit of EPSG:{@code code}; the note says why it is empty when it is. */
  static Lookup of(int code) {
    return CACHE.computeIfAbsent(code, EpsgUnits::lookUp);
  }

  private static Lookup lookUp(int code) {
    CoordinateReferenceSystem crs;
    try {
      crs = new CRSFactory().createFromName("EPSG:" + code);
    } catch (RuntimeException e) {
      // proj4j reports unknown codes and unparsable definitions with several runtime exceptions.
      return new Lookup(Optional.empty(), false,
          "EPSG:" + code + " is not in proj4j's EPSG database");
    }
    if (crs.getProjection() instanceof LongLatProjection) {
      return new Lookup(Optional.empty(), true, "EPSG:" + code + " is a geographic CRS");
    }
    Unit u = crs.getProjection().getUnits();
    Optional<LinearUnit> unit = u == null ? Optional.empty() : Units.byFactor(u.value);
    String note = unit.isPresent() ? "" : "EPSG:" + code + " uses unit '"
        + (u == null ? "?" : u.name) + "', not metre, foot or US survey foot";
    return new Lookup(unit, false, note);
  }
}
