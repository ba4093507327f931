#pragma once
// The intensity cap of each microcycle day as an editable form: one row a day, in the order a
// week runs towards a match (MD-4 … MD-1, MD, MD+1, MD+2, other days), each holding the text the
// coach typed until it is saved.

#include "fixtures.h"

#include <QAbstractListModel>
#include <QString>
#include <QStringList>
#include <QtQml/qqmlregistration.h>

#include <optional>

namespace pitchloop::desktop {

class IntensityCapModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("The settings page fills the intensity caps")
public:
    enum Role {
        DayRole = Qt::UserRole + 1, ///< "MD-4", "MD", "Other days"
        ExplanationRole,            ///< "four days before a match"
        TextRole,                   ///< what is typed (editable)
        NameRole,                   ///< "high", "no session", or how to fix the text
        ValidRole,                  ///< the typed text is a whole number from 0 to 5
        StoredRole,                 ///< the cap stored in the club file
        DefaultRole,                ///< the documented default
    };
    Q_ENUM(Role)

    explicit IntensityCapModel(QObject* parent = nullptr);

    static constexpr int kDays = 8;

    /// Shows the stored caps (and their texts, replacing what was typed).
    void load(const model::IntensityCaps& stored);
    /// The typed texts, in row order.
    QStringList texts() const;
    void setTexts(const QStringList& texts);
    /// Row `row`'s typed text as a whole number; nullopt when it is not one.
    std::optional<int> typedCap(int row) const;
    /// The caps the typed texts give; rows that are not whole numbers keep `fallback`'s value.
    model::IntensityCaps typedCaps(const model::IntensityCaps& fallback) const;
    /// The row of a model::parseCaps field ("md", "md_plus[0]", "md_minus[3]", "other"); -1.
    static int rowOfField(const std::string& field);
    QString dayAt(int row) const;

    /// Changes one row's text (as typing does); false for a bad row.
    Q_INVOKABLE bool setText(int row, const QString& text);

    int rowCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    bool setData(const QModelIndex& index, const QVariant& value, int role) override;
    Qt::ItemFlags flags(const QModelIndex& index) const override;
    QHash<int, QByteArray> roleNames() const override;

private:
    QString m_texts[kDays];
    int m_stored[kDays] = {};
    bool m_loaded = false;
};

} // namespace pitchloop::desktop
