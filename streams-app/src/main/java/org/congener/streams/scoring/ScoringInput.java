package org.congener.streams.scoring;

import org.congener.schemas.Researcher;
import org.congener.streams.model.LiveModel;
import org.congener.streams.state.GroupPopularity;
import org.congener.streams.state.InteractionProfile;

/**
 * Everything a scorer may read for one researcher at one moment.
 *
 * @param atEpochMs time of the triggering event; recency is measured against it, so replays give the
 *                  same lists as the live run
 * @param model     the live model snapshot taken once for this event, or null before any version is live
 * @param group     the group's popularity; kept and given only while no version is live, else null
 * @param similar   the ontology's neighbour lists over the catalogue, given only while no version is
 *                  live and an ontology is configured, else null
 */
public record ScoringInput(Researcher researcher, InteractionProfile profile, GroupPopularity group,
                           long atEpochMs, CandidateFilter eligible, LiveModel model, SimilarCompounds similar) {
}
