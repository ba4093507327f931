pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import QtQuick.Dialogs
import Pitchloop

// A focus's follow-up review: before and after with their intervals, the change and its test,
// the training time, the control chart, and the staff's verdict (which closes the focus and
// stores these numbers with it). The verdict's text lives in the controller.
Card {
    id: root

    required property FocusView view
    /// Plain words for the chart and its key, or the analyst's terms.
    property bool plainWords: true

    title: qsTr("Follow-up review")

    component Line: Label {
        Layout.fillWidth: true
        color: Theme.text
        wrapMode: Text.WordWrap
        font.pixelSize: Theme.fontSmall + 1
    }
    component KeyEntry: Row {
        id: entry
        property alias text: label.text
        default property alias swatch: holder.data
        spacing: Theme.gapSmall
        Item {
            id: holder
            width: 18
            height: 14
            anchors.verticalCenter: parent.verticalCenter
        }
        Label {
            id: label
            anchors.verticalCenter: parent.verticalCenter
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall
        }
    }

    Label {
        visible: !root.view.hasReview
        Layout.fillWidth: true
        text: root.view.reviewProblem
        color: Theme.text
        wrapMode: Text.WordWrap
    }

    RowLayout {
        visible: root.view.hasReview
        spacing: Theme.margin
        FigureTile {
            value: root.view.beforeValueText
            caption: qsTr("before the start")
        }
        Label {
            text: "→"
            font.pixelSize: Theme.fontHeading
            color: Theme.textMuted
        }
        FigureTile {
            value: root.view.afterValueText
            caption: qsTr("from the start on")
        }
    }
    Line { visible: root.view.hasReview; text: root.view.testText; font.bold: true }
    // The numbers behind the finding: the analyst's layer (in plain words they are one
    // switch away, in the side bar).
    Line { visible: root.view.hasReview && !root.plainWords; text: root.view.beliefText }
    Line { visible: root.view.hasReview && !root.plainWords; text: root.view.changeText }
    Line { visible: root.view.hasReview && !root.plainWords; text: root.view.beforeText }
    Line { visible: root.view.hasReview && !root.plainWords; text: root.view.afterText }
    Line {
        visible: root.view.hasReview && root.plainWords
        text: qsTr("The numbers behind this (chances, ranges, the matches compared) are under Numbers at the bottom of the side bar.")
        color: Theme.textMuted
    }
    Line { visible: root.view.hasReview; text: root.view.caveatText; color: Theme.textMuted }
    Line { visible: root.view.hasReview; text: root.view.trainingText; color: Theme.textMuted }

    Label {
        visible: root.view.hasReview
        Layout.fillWidth: true
        Layout.topMargin: Theme.gap
        text: root.plainWords
              ? qsTr("Each match against the usual range of the %1 matches before training started (the range allows for the usual swing from match to match)").arg(root.view.chartBaselineMatches)
              : root.view.chartTitle
        color: Theme.textMuted
        font.pixelSize: Theme.fontSmall
        font.bold: true
        wrapMode: Text.WordWrap
    }
    ControlChart {
        visible: root.view.hasReview
        Layout.fillWidth: true
        Layout.preferredHeight: 230
        chart: root.view.chart
    }
    Flow {
        visible: root.view.hasReview
        Layout.fillWidth: true
        spacing: Theme.gapLarge
        KeyEntry {
            text: qsTr("match value")
            Rectangle { width: 8; height: 8; radius: 4; color: "#3b4352"; anchors.centerIn: parent }
        }
        KeyEntry {
            text: root.plainWords ? qsTr("usual level before training") : qsTr("centre line")
            Rectangle { width: 18; height: 2; color: "#7c8594"; anchors.centerIn: parent }
        }
        KeyEntry {
            text: root.plainWords ? qsTr("usual range before training") : qsTr("3σ limits")
            Row {
                anchors.centerIn: parent
                spacing: 3
                Repeater {
                    model: 3
                    Rectangle { width: 4; height: 2; color: Theme.text }
                }
            }
        }
        KeyEntry {
            text: root.plainWords ? qsTr("recent form") : qsTr("EWMA")
            Rectangle { width: 18; height: 3; color: Theme.accent; anchors.centerIn: parent }
        }
        KeyEntry {
            text: root.plainWords ? qsTr("outside the usual range, better") : qsTr("beyond a limit, better side")
            StateMarker { zoneState: ZoneState.OnTarget; size: 13; anchors.centerIn: parent }
        }
        KeyEntry {
            text: root.plainWords ? qsTr("outside the usual range, worse") : qsTr("worse side")
            StateMarker { zoneState: ZoneState.OffTarget; size: 13; anchors.centerIn: parent }
        }
    }
    Line { visible: root.view.hasReview; text: root.view.chartReadingText }
    Label {
        visible: root.view.reviewSourceText.length > 0
        Layout.fillWidth: true
        text: root.view.reviewSourceText
        color: Theme.textMuted
        font.pixelSize: Theme.fontSmall
        wrapMode: Text.WordWrap
    }

    // The verdict
    Label {
        visible: root.view.closed
        Layout.fillWidth: true
        Layout.topMargin: Theme.gap
        text: root.view.verdictText
        font.bold: true
        color: Theme.text
        wrapMode: Text.WordWrap
    }
    ColumnLayout {
        visible: root.view.canRecordVerdict
        Layout.fillWidth: true
        Layout.topMargin: Theme.gap
        spacing: Theme.gapSmall
        Label {
            text: qsTr("The staff's verdict (closes the focus and stores these numbers with it)")
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall
            font.bold: true
        }
        Flow {
            Layout.fillWidth: true
            spacing: Theme.gapSmall
            Repeater {
                model: root.view.verdictOptions
                delegate: RadioButton {
                    required property var modelData
                    text: modelData.text
                    checked: root.view.verdictChoice === modelData.value
                    onClicked: root.view.verdictChoice = modelData.value
                }
            }
        }
        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.gap
            TextField {
                objectName: "verdictNote"
                Layout.fillWidth: true
                Layout.preferredWidth: 3
                text: root.view.verdictNote
                placeholderText: qsTr("what the staff saw, in a line")
                onTextEdited: root.view.verdictNote = text
            }
            TextField {
                objectName: "verdictBy"
                Layout.fillWidth: true
                Layout.preferredWidth: 2
                text: root.view.verdictBy
                placeholderText: qsTr("recorded by")
                onTextEdited: root.view.verdictBy = text
            }
            Button {
                text: qsTr("Record verdict")
                highlighted: true
                onClicked: root.view.recordVerdict()
            }
        }
        Label {
            visible: root.view.verdictProblem.length > 0
            Layout.fillWidth: true
            text: "▲ " + root.view.verdictProblem
            color: Theme.error
            wrapMode: Text.WordWrap
        }
        RowLayout {
            visible: root.view.canExportReviewMoments
            Layout.fillWidth: true
            spacing: Theme.gap
            Button {
                objectName: "reviewMomentsButton"
                text: qsTr("Moments before and after (CSV)…")
                ToolTip.visible: hovered
                ToolTip.delay: 400
                ToolTip.text: qsTr("Every moment behind the baseline's and the after matches' numbers, side by side, to watch again")
                onClicked: {
                    momentsDialog.selectedFile = "review-moments.csv"
                    momentsDialog.open()
                }
            }
            Label {
                Layout.fillWidth: true
                text: root.view.momentsMessage
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall
                elide: Text.ElideMiddle
            }
        }
    }

    FileDialog {
        id: momentsDialog
        title: qsTr("Save the review's moments as CSV")
        fileMode: FileDialog.SaveFile
        defaultSuffix: "csv"
        nameFilters: [qsTr("CSV files (*.csv)")]
        onAccepted: root.view.exportReviewMoments(selectedFile)
    }
}
