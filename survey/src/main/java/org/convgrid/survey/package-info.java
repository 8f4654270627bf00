/**
 * The application layer: owns a run directory (creation, resume, shards, merge, track files, the finished tables and
 * manifest) and drives grid runs through the engine's solver; prints nothing.
 */
package org.convgrid.survey;
