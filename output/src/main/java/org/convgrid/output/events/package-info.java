/**
 * The life-events table of a run ({@code life_events.csv}): per star evolved from birth, the ages at which its life
 * changes.
 */
package org.convgrid.output.events;
