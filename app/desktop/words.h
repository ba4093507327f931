#pragma once
// The app's one vocabulary for QML (Words.stateName(ZoneState.OffTarget), ...): the same words
// as model/wording.h, so a legend and a list never name a state differently.

#include <QObject>
#include <QString>
#include <QtQml/qqmlregistration.h>

namespace pitchloop::desktop {

class Words : public QObject {
    Q_OBJECT
    QML_ELEMENT
    QML_SINGLETON
public:
    explicit Words(QObject* parent = nullptr) : QObject(parent) {}

    /// A ZoneState value as a heading or key entry: "Off target", "Likely off", ...
    Q_INVOKABLE QString stateName(int zoneState) const;
    /// "Back on target".
    Q_INVOKABLE QString backOnTarget() const;
};

} // namespace pitchloop::desktop
