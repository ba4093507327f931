#include "words.h"

#include "wording.h"
#include "zonestate.h"

namespace pitchloop::desktop {

using namespace pitchloop::model;

QString Words::stateName(int zoneState) const {
    FlagState state = FlagState::NoTarget;
    switch (static_cast<ZoneState::Value>(zoneState)) {
    case ZoneState::OnTarget: state = FlagState::OnTarget; break;
    case ZoneState::CloseToLine: state = FlagState::CloseToLine; break;
    case ZoneState::LikelyOff: state = FlagState::LikelyOff; break;
    case ZoneState::OffTarget: state = FlagState::OffTarget; break;
    case ZoneState::TooLittleData: state = FlagState::TooLittleData; break;
    case ZoneState::NoTarget: state = FlagState::NoTarget; break;
    }
    return QString::fromStdString(words::capitalised(words::stateName(state)));
}

QString Words::backOnTarget() const { return QString::fromStdString(words::capitalised(words::backOnTarget())); }

} // namespace pitchloop::desktop
