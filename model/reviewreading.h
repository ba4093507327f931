#pragma once
// Reading a follow-up review: what its control chart says at a glance and the span it needs
// on an axis, and a stored review's numbers read back from their JSON (docs/reviews.md).

#include "focus.h"

#include <cstddef>
#include <optional>
#include <string>

namespace pitchloop::model {

/// A review's match-by-match chart (p-chart for rates, u-chart for counts; centre and 3σ limits
/// from the before window) reduced to what a reader checks first.
struct ChartReading {
    std::size_t beforeMatches = 0;
    std::size_t afterMatches = 0;
    int afterOnBetterSide = 0; ///< after-window matches beyond the limit on the metric's better side
    int afterOnWorseSide = 0;  ///< ... beyond the limit on its worse side
    int beforeOutside = 0;     ///< before-window matches outside their own limits: an unsteady baseline
    double low = 0;            ///< smallest finite number drawn (values, centre, limits, EWMA); NaN if none
    double high = 0;           ///< largest
};
ChartReading readChart(const Review& review);

/// A review's numbers from reviewToJson's text (as FocusStore keeps them with a verdict);
/// nulls come back as NaN. nullopt when the text is not such a review.
std::optional<Review> reviewFromJson(const std::string& json);

} // namespace pitchloop::model
