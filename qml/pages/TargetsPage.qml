pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// The season's targets zone by zone: pick zones on the pitch (click, Shift+click, drag), set one
// metric's target for them, retire it, copy last season's, undo the last change. Each zone shows
// its target in force and what last season achieved; the picked zone's history sits beside.
Page {
    id: root

    required property ClubSession session
    property bool plainWords: true
    readonly property alias editor: editor

    background: Rectangle { color: Theme.window }

    TargetsView {
        id: editor
        session: root.session
    }

    Shortcut {
        sequence: "Ctrl+Z"
        enabled: root.visible && editor.canUndo
        onActivated: editor.undo()
    }
    Shortcut {
        sequence: "Ctrl+S"
        enabled: root.visible
        onActivated: editor.save()
    }
    Shortcut {
        sequence: "Ctrl+A"
        enabled: root.visible && editor.hasMetric
        onActivated: editor.selectArea(1, 1, editor.geometry.bands, editor.geometry.lanes, false)
    }

    Label {
        visible: !editor.hasMetric
        anchors.centerIn: parent
        width: Math.min(parent.width - 2 * Theme.margin, 640)
        wrapMode: Text.WordWrap
        horizontalAlignment: Text.AlignHCenter
        text: qsTr("No metrics in this club file yet, so there is nothing to set a target for.")
        color: Theme.text
    }

    ColumnLayout {
        visible: editor.hasMetric
        anchors.fill: parent
        anchors.margins: Theme.margin
        spacing: Theme.gap

        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.gap
            Label {
                text: qsTr("Season targets")
                font.pixelSize: Theme.fontHeading
                font.bold: true
                color: Theme.text
            }
            Item { Layout.preferredWidth: Theme.gapLarge }
            ComboBox {
                objectName: "seasonBox"
                Layout.preferredWidth: 110
                model: editor.seasonOptions
                currentIndex: editor.seasonRow
                onActivated: editor.season = currentText
            }
            ComboBox {
                objectName: "metricBox"
                Layout.preferredWidth: 300
                model: root.session.metrics
                textRole: "name"
                valueRole: "metricId"
                currentIndex: editor.metricRow
                onActivated: editor.metricId = currentValue
            }
            Item { Layout.fillWidth: true }
            Button {
                text: editor.copyText
                visible: editor.copyText.length > 0
                enabled: editor.canCopy
                onClicked: editor.copyFromPreviousSeason()
                ToolTip.visible: hovered
                ToolTip.delay: 500
                ToolTip.text: qsTr("Every target in force at the end of %1 starts again on 1 July of this season. Undo takes it back.").arg(editor.previousSeason)
            }
            Button {
                text: qsTr("Undo  Ctrl+Z")
                enabled: editor.canUndo
                onClicked: editor.undo()
                ToolTip.visible: hovered && editor.canUndo
                ToolTip.delay: 300
                ToolTip.text: editor.undoText
            }
        }

        Label {
            Layout.fillWidth: true
            text: editor.asOfText + "  ·  " + editor.lastSeasonText
            color: Theme.textMuted
            elide: Text.ElideRight
        }

        RowLayout {
            Layout.fillWidth: true
            Layout.fillHeight: true
            spacing: Theme.gapLarge

            ColumnLayout {
                Layout.fillWidth: true
                Layout.fillHeight: true
                spacing: Theme.gap

                TargetZonePicker {
                    objectName: "zonePicker"
                    Layout.fillWidth: true
                    Layout.preferredHeight: width * editor.geometry.extentWidth / editor.geometry.extentLength
                    geometry: editor.geometry
                    heat: editor.lastSeasonMap
                    zones: editor.zones
                    onZoneClicked: (band, lane, additive) => editor.selectZone(band, lane, additive)
                    onAreaSelected: (band1, lane1, band2, lane2, additive) => editor.selectArea(band1, lane1, band2, lane2, additive)
                }
                Label {
                    Layout.fillWidth: true
                    text: qsTr("Click a zone · Shift+click adds or removes one · drag across zones for a block · Ctrl+A takes every zone")
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall
                    wrapMode: Text.WordWrap
                }
                RowLayout {
                    Layout.fillWidth: true
                    spacing: Theme.gapLarge
                    Button {
                        objectName: "wholePitchButton"
                        text: editor.wholePitchLastSeasonText.length > 0
                              ? qsTr("Whole pitch: %1 · was %2").arg(editor.wholePitchTargetText).arg(editor.wholePitchLastSeasonText)
                              : qsTr("Whole pitch: %1").arg(editor.wholePitchTargetText)
                        checkable: true
                        checked: editor.wholePitchSelected
                        onClicked: editor.selectZone(0, 0, false)
                    }
                    Legend {
                        Layout.fillWidth: true
                        visible: editor.hasPreviousSeason
                        compact: true
                        showStates: false
                        title: qsTr("Zone colour: %1 achieved in %2").arg(editor.metricName).arg(editor.previousSeason)
                        labels: editor.lastSeasonMap.scaleLabels
                    }
                    Item {
                        Layout.fillWidth: true
                        visible: !editor.hasPreviousSeason
                    }
                }
                Item { Layout.fillHeight: true }
            }

            ColumnLayout {
                Layout.preferredWidth: 420
                Layout.maximumWidth: 420
                Layout.fillHeight: true
                spacing: Theme.gapLarge

                Card {
                    Layout.fillWidth: true
                    Layout.preferredHeight: implicitHeight
                    title: qsTr("Set %1 · %2").arg(editor.metricName).arg(editor.selectionText)
                    Label {
                        visible: editor.selectedCount === 0
                        Layout.fillWidth: true
                        text: qsTr("Pick the zones on the pitch first: click one, Shift+click to add more, or drag across a block.")
                        wrapMode: Text.WordWrap
                        color: Theme.accent
                    }
                    TargetEditor {
                        Layout.fillWidth: true
                        plainWords: root.plainWords
                        view: editor
                    }
                }

                Card {
                    Layout.fillWidth: true
                    Layout.fillHeight: true
                    title: editor.focusText.length > 0 ? qsTr("History · %1").arg(editor.focusText) : qsTr("History")
                    Label {
                        visible: editor.focusText.length > 0
                        Layout.fillWidth: true
                        text: editor.focusTargetText
                        font.bold: true
                        color: Theme.text
                        elide: Text.ElideRight
                    }
                    Label {
                        visible: editor.history.count === 0
                        Layout.fillWidth: true
                        wrapMode: Text.WordWrap
                        text: editor.focusText.length > 0
                              ? qsTr("No version of this target is stored for %1 yet.").arg(editor.season)
                              : qsTr("Pick a zone to see every version of its target: when, who, the value and why.")
                        color: Theme.textMuted
                    }
                    ListView {
                        id: historyList
                        Layout.fillWidth: true
                        Layout.fillHeight: true
                        visible: editor.history.count > 0
                        clip: true
                        model: editor.history
                        boundsBehavior: Flickable.StopAtBounds
                        ScrollBar.vertical: ScrollBar {}
                        delegate: TargetHistoryDelegate {
                            width: historyList.width - 10
                        }
                    }
                    Item {
                        visible: editor.history.count === 0
                        Layout.fillHeight: true
                    }
                }
            }
        }
    }
}
