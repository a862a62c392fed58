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
 */
public record ScoringInput(Researcher researcher, InteractionProfile profile, GroupPopularity group,
                           long atEpochMs, CandidateFilter eligible, LiveModel model) {
}
