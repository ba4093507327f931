pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// Two sets of the season's matches on one map (docs/statistics.md, "Comparing two sets of
// matches"): the split, the difference map in the diverging value-suppressing palette with its
// key, and the zones with the strongest evidence of a difference.
ColumnLayout {
    id: root

    required property ComparisonView view
    required property PitchGeometry geometry

    spacing: Theme.gap

    RowLayout {
        Layout.fillWidth: true
        spacing: Theme.gap
        Label { text: qsTr("Compare"); color: Theme.textMuted }
        ComboBox {
            id: splitKind
            objectName: "compareSplit"
            Layout.preferredWidth: 260
            textRole: "text"
            valueRole: "value"
            currentIndex: root.view.split.startsWith("date:") ? 1 : root.view.split.startsWith("opponent:") ? 2 : 0
            model: [
                { text: qsTr("home against away"), value: "venue" },
                { text: qsTr("before against from a date"), value: "date" },
                { text: qsTr("one opponent against the rest"), value: "opponent" }
            ]
            onActivated: root.apply()
        }
        TextField {
            id: dateField
            objectName: "compareDate"
            visible: splitKind.currentValue === "date"
            Layout.preferredWidth: 110
            placeholderText: qsTr("YYYY-MM-DD")
            text: "2026-10-01"
            onEditingFinished: root.apply()
        }
        ComboBox {
            id: opponentField
            visible: splitKind.currentValue === "opponent"
            Layout.preferredWidth: 220
            model: root.view.opponents
            onActivated: root.apply()
        }
        Item { Layout.fillWidth: true }
    }

    RowLayout {
        Layout.fillWidth: true
        Layout.fillHeight: true
        spacing: Theme.gapLarge

        ColumnLayout {
            spacing: 2
            PitchMap {
                objectName: "compareMap"
                Layout.preferredWidth: 360
                Layout.preferredHeight: 200
                geometry: root.geometry
                zones: root.view.map
            }
            // The key: lower to higher across, sure to unsure down.
            RowLayout {
                spacing: Theme.gap
                Label { text: root.view.lowText; color: Theme.textMuted; font.pixelSize: Theme.fontSmall }
                Column {
                    id: key
                    spacing: 1
                    Repeater {
                        model: MapPalette.rows
                        delegate: Row {
                            id: keyRow
                            required property int index
                            readonly property var colours: MapPalette.divergingRow(index)
                            Repeater {
                                model: keyRow.colours
                                delegate: Rectangle {
                                    required property string modelData
                                    width: 160 / keyRow.colours.length
                                    height: 6
                                    color: modelData
                                }
                            }
                        }
                    }
                }
                Label { text: root.view.highText; color: Theme.textMuted; font.pixelSize: Theme.fontSmall }
            }
        }

        ColumnLayout {
            Layout.fillWidth: true
            Layout.fillHeight: true
            spacing: Theme.gap
            Label {
                objectName: "compareSummary"
                Layout.fillWidth: true
                text: root.view.summaryText
                color: Theme.text
                wrapMode: Text.WordWrap
            }
            Label {
                visible: root.view.strongest.length > 0
                text: qsTr("Strongest evidence of a difference")
                color: Theme.textMuted
                font.bold: true
            }
            Repeater {
                model: root.view.strongest
                delegate: Label {
                    required property string modelData
                    Layout.fillWidth: true
                    text: modelData
                    color: Theme.text
                    elide: Text.ElideRight
                }
            }
            Item { Layout.fillHeight: true }
        }
    }

    function apply() {
        const kind = splitKind.currentValue
        if (kind === "date")
            root.view.split = "date:" + dateField.text
        else if (kind === "opponent")
            root.view.split = "opponent:" + opponentField.currentText
        else
            root.view.split = "venue"
    }
}
