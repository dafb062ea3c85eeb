package org.beamfolio.model;

/**
 * One input that differs between two revisions of a job: its key path and its text before and
 * now ({@code null} where the input was not given).
 */
public record InputChange(String key, String before, String now) {}
