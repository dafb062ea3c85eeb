package org.beamfolio.model;

/** A named section: its shape, and whether it is turned upside down. */
public record Section(String id, SectionShape shape, boolean flip) {}
