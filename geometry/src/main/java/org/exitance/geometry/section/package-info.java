/**
 * View factors of 2-D cross-sections (infinitely long geometries: tunnel furnaces, tubes over a
 * strip, long ducts) by Hottel's crossed strings, with strings wrapped around tubes, arcs and
 * convex surfaces. Entry point: {@link org.exitance.geometry.section.SectionViewFactors#compute}.
 * Method, what is supported and what is refused: docs/view-factors.md, "2-D sections".
 */
package org.exitance.geometry.section;
