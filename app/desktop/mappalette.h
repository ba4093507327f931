#pragma once
// The zone maps' value-suppressing palette for QML (MapPalette.row(0) ...), from model/
// palette.h, so the legend and the cells can never use two different palettes.

#include <QObject>
#include <QStringList>
#include <QtQml/qqmlregistration.h>

namespace pitchloop::desktop {

class MapPalette : public QObject {
    Q_OBJECT
    QML_ELEMENT
    QML_SINGLETON
    /// Rows of the palette, most certain first.
    Q_PROPERTY(int rows READ rows CONSTANT)
public:
    explicit MapPalette(QObject* parent = nullptr) : QObject(parent) {}
    int rows() const;
    /// Row `level`'s colours, low value to high ("#rrggbb").
    Q_INVOKABLE QStringList row(int level) const;
    /// The difference maps' diverging row `level`: lower to higher.
    Q_INVOKABLE QStringList divergingRow(int level) const;
};

} // namespace pitchloop::desktop
