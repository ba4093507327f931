#pragma once
// How a zone stands against its target, as QML sees it (ZoneState.OffTarget, ...).

#include "status.h"

#include <QObject>
#include <QtQml/qqmlregistration.h>

namespace pitchloop::desktop {

/// The flag states of model::FlagState under the app's own names, as a QML enum.
class ZoneState : public QObject {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("ZoneState only names the states of a zone")
public:
    enum Value { NoTarget, OnTarget, CloseToLine, OffTarget, TooLittleData, LikelyOff };
    Q_ENUM(Value)

    static constexpr Value from(model::FlagState s) {
        switch (s) {
        case model::FlagState::OnTarget: return OnTarget;
        case model::FlagState::CloseToLine: return CloseToLine;
        case model::FlagState::LikelyOff: return LikelyOff;
        case model::FlagState::OffTarget: return OffTarget;
        case model::FlagState::TooLittleData: return TooLittleData;
        case model::FlagState::NoTarget: return NoTarget;
        }
        return NoTarget;
    }
};

} // namespace pitchloop::desktop
