pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// Opening a focus: the match and metric, the zones (picked on that match's judged map), the
// evidence that will be frozen, drills to work on it, the review point, a note and who opens
// it. Everything typed lives in the controller; a refused open keeps it and lists what to fix.
// Its lists take their models only while a focus is being drafted.
Card {
    id: root

    required property FocusView view
    required property ClubSession session
    property alias searchField: search

    title: qsTr("Open a focus")

    component Heading: Label {
        Layout.fillWidth: true
        elide: Text.ElideRight
        color: Theme.textMuted
        font.pixelSize: Theme.fontSmall
        font.bold: true
        Layout.topMargin: Theme.gapSmall
    }

    RowLayout {
        Layout.fillWidth: true
        spacing: Theme.gap
        Label { text: qsTr("After"); color: Theme.textMuted }
        ComboBox {
            Layout.fillWidth: true
            Layout.preferredWidth: 3
            model: root.session.matches
            textRole: "label"
            valueRole: "matchId"
            currentIndex: root.view.draftMatchRow
            onActivated: root.view.setDraftMatch(currentValue)
        }
        Label { text: qsTr("Metric"); color: Theme.textMuted }
        ComboBox {
            Layout.fillWidth: true
            Layout.preferredWidth: 2
            model: root.session.metrics
            textRole: "name"
            valueRole: "metricId"
            currentIndex: root.view.draftMetricRow
            onActivated: root.view.setDraftMetric(currentValue)
        }
    }

    RowLayout {
        Layout.fillWidth: true
        spacing: Theme.gapLarge
        ColumnLayout {
            Layout.alignment: Qt.AlignTop
            spacing: 2
            Heading { text: qsTr("Zones · %1 at this match").arg(root.view.draftMap.title.toLowerCase()) }
            DrillZonePicker {
                Layout.preferredWidth: 330
                Layout.preferredHeight: 212
                geometry: root.view.geometry
                zones: root.view.draftMap
                chosen: root.view.draftZones
                onZoneToggled: (band, lane) => root.view.toggleDraftZone(band, lane)
            }
            Legend {
                Layout.preferredWidth: 330
                compact: true
                showSwatches: false
                showStates: false
                title: qsTr("%1, %2").arg(root.view.draftMetricName).arg(root.view.draftMap.title.toLowerCase())
                labels: root.view.draftMap.scaleLabels
            }
            CheckBox {
                text: qsTr("Whole pitch")
                checked: root.view.draftWholePitch
                onToggled: root.view.setDraftWholePitch(checked)
            }
        }
        ColumnLayout {
            Layout.fillWidth: true
            Layout.alignment: Qt.AlignTop
            spacing: 2
            Heading { text: qsTr("Evidence frozen with it · %1 · %2").arg(root.view.draftMetricName).arg(root.view.draftZonesText) }
            Label {
                Layout.fillWidth: true
                text: root.view.draftSlipText
                color: root.view.draftSlipped ? Theme.text : Theme.error
                font.pixelSize: Theme.fontSmall
                wrapMode: Text.WordWrap
            }
            ListView {
                Layout.fillWidth: true
                Layout.preferredHeight: 190
                clip: true
                spacing: 2
                model: root.view.drafting ? root.view.draftEvidence : null
                boundsBehavior: Flickable.StopAtBounds
                ScrollBar.vertical: ScrollBar {}
                delegate: EvidenceRowDelegate {
                    width: ListView.view.width - 8
                }
            }
        }
    }
    Label {
        Layout.fillWidth: true
        text: root.view.draftStartText
        color: Theme.textMuted
        font.pixelSize: Theme.fontSmall
        wrapMode: Text.WordWrap
    }

    RowLayout {
        Layout.fillWidth: true
        spacing: Theme.gapLarge
        ColumnLayout {
            Layout.fillWidth: true
            Layout.preferredWidth: 1
            Layout.alignment: Qt.AlignTop
            spacing: 2
            Heading { text: qsTr("Drills to work on it (%1)").arg(root.view.draftDrills.count) }
            ListView {
                Layout.fillWidth: true
                Layout.preferredHeight: 140
                clip: true
                model: root.view.drafting ? root.view.draftDrills : null
                ScrollBar.vertical: ScrollBar {}
                delegate: DrillRowDelegate {
                    compact: true
                    actionText: qsTr("Remove")
                    onActionClicked: root.view.dropDraftDrill(drillId)
                }
            }
        }
        ColumnLayout {
            Layout.fillWidth: true
            Layout.preferredWidth: 1
            Layout.alignment: Qt.AlignTop
            spacing: 2
            TextField {
                id: search
                Layout.fillWidth: true
                placeholderText: qsTr("Search the drill book (Ctrl+F)")
                text: root.view.drillQuery
                onTextEdited: root.view.drillQuery = text
            }
            Label {
                Layout.fillWidth: true
                text: root.view.drillSearchText
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall
                elide: Text.ElideRight
            }
            ListView {
                Layout.fillWidth: true
                Layout.preferredHeight: 104
                clip: true
                model: root.view.drafting ? root.view.drillResults : null
                ScrollBar.vertical: ScrollBar {}
                delegate: DrillRowDelegate {
                    compact: true
                    actionText: qsTr("Pick")
                    onActionClicked: root.view.pickDraftDrill(drillId)
                }
            }
        }
    }

    GridLayout {
        Layout.fillWidth: true
        columns: 4
        columnSpacing: Theme.gap
        rowSpacing: Theme.gapSmall
        Label { text: qsTr("Review after"); color: Theme.textMuted }
        RowLayout {
            SpinBox {
                from: 1
                to: 20
                value: root.view.draftReviewAfter
                onValueModified: root.view.draftReviewAfter = value
            }
            Label { text: qsTr("matches"); color: Theme.textMuted }
        }
        Label { text: qsTr("or on"); color: Theme.textMuted }
        TextField {
            objectName: "draftReviewOn"
            Layout.fillWidth: true
            text: root.view.draftReviewOn
            placeholderText: qsTr("YYYY-MM-DD (optional)")
            onTextEdited: root.view.draftReviewOn = text
        }
        Label { text: qsTr("Note"); color: Theme.textMuted }
        TextField {
            objectName: "draftNote"
            Layout.fillWidth: true
            Layout.columnSpan: 3
            text: root.view.draftNote
            placeholderText: qsTr("what the staff saw, for whoever reads it later")
            onTextEdited: root.view.draftNote = text
        }
        Label { text: qsTr("Smallest change that matters"); color: Theme.textMuted }
        TextField {
            objectName: "draftMinChange"
            Layout.fillWidth: true
            Layout.columnSpan: 3
            text: root.view.draftMinChange
            placeholderText: qsTr("e.g. 8 (points for a share, the metric's unit for a count); empty: the target's margin")
            onTextEdited: root.view.draftMinChange = text
        }
        Label { text: qsTr("Opened by *"); color: Theme.textMuted }
        TextField {
            objectName: "draftBy"
            Layout.fillWidth: true
            Layout.columnSpan: 3
            text: root.view.draftBy
            placeholderText: qsTr("your name and role")
            onTextEdited: root.view.draftBy = text
        }
    }

    Repeater {
        model: root.view.draftProblems
        delegate: Label {
            required property string modelData
            Layout.fillWidth: true
            text: "▲ " + modelData
            color: Theme.error
            wrapMode: Text.WordWrap
        }
    }

    RowLayout {
        Layout.fillWidth: true
        spacing: Theme.gap
        Button {
            text: qsTr("Open focus (Ctrl+S)")
            highlighted: true
            onClicked: root.view.confirmDraft()
        }
        Button {
            text: qsTr("Cancel (Esc)")
            onClicked: root.view.cancelDraft()
        }
    }
}
