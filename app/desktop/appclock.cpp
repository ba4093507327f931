#include "appclock.h"

#include "clock.h"

namespace pitchloop::desktop {

std::string todayIso() { return model::todayIso(); }

std::string nowUtcIso() { return model::nowUtcIso(); }

} // namespace pitchloop::desktop
