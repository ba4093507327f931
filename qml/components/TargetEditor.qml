pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// The form that sets one metric's target for the selected zones: value (rates as a percentage),
// direction, watch margin, minimum sample, why, who and from when; save or retire. The text
// lives in the controller, so nothing typed is lost when a save is refused.
ColumnLayout {
    id: root

    required property TargetsView view
    /// The coach's words for the form's two rule fields, or the analyst's (the other as a tip).
    property bool plainWords: true

    spacing: Theme.gap

    component FieldLabel: Label {
        color: Theme.textMuted
        Layout.alignment: Qt.AlignVCenter | Qt.AlignRight
    }
    component Unit: Label {
        color: Theme.textMuted
        font.pixelSize: Theme.fontSmall
        Layout.preferredWidth: 116
        elide: Text.ElideRight
    }

    GridLayout {
        Layout.fillWidth: true
        columns: 3
        columnSpacing: Theme.gap
        rowSpacing: Theme.gapSmall + 2

        FieldLabel { text: qsTr("Value") }
        TextField {
            objectName: "valueField"
            Layout.fillWidth: true
            text: root.view.valueText
            placeholderText: root.view.isRate ? qsTr("e.g. 45") : qsTr("e.g. 2.5")
            onTextEdited: root.view.valueText = text
        }
        Unit { text: root.view.unitText }

        FieldLabel { text: qsTr("Direction") }
        RowLayout {
            Layout.columnSpan: 2
            spacing: Theme.gap
            RadioButton {
                objectName: "atLeast"
                text: qsTr("at least")
                checked: root.view.direction === 0
                onClicked: root.view.direction = 0
            }
            RadioButton {
                objectName: "atMost"
                text: qsTr("at most")
                checked: root.view.direction === 1
                onClicked: root.view.direction = 1
            }
            Label {
                Layout.fillWidth: true
                text: root.view.betterText.toLowerCase()
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall
                elide: Text.ElideRight
            }
        }

        FieldLabel {
            objectName: "marginLabel"
            text: root.plainWords ? qsTr("Close to the line within") : qsTr("Watch margin")
        }
        TextField {
            objectName: "marginField"
            Layout.fillWidth: true
            text: root.view.marginText
            onTextEdited: root.view.marginText = text
            ToolTip.visible: hovered
            ToolTip.delay: 500
            ToolTip.text: root.plainWords
                          ? qsTr("A zone this close to the target on the good side shows as “close to the line” (the watch margin)")
                          : qsTr("How far on the good side of the target a zone is still watched")
        }
        Unit { text: root.view.marginUnitText }

        FieldLabel {
            objectName: "minSampleLabel"
            text: root.plainWords ? qsTr("Judge from") : qsTr("Min. sample")
        }
        TextField {
            objectName: "minSampleField"
            Layout.fillWidth: true
            text: root.view.minSampleText
            onTextEdited: root.view.minSampleText = text
            ToolTip.visible: hovered
            ToolTip.delay: 500
            ToolTip.text: root.plainWords
                          ? qsTr("With fewer %1 than this in a window, the zone says “too little data” instead of judging (the minimum sample)").arg(root.view.sampleUnitText)
                          : qsTr("Below this many in a window a zone shows “too little data” instead of a judgement")
        }
        Unit { text: root.view.sampleUnitText }

        FieldLabel { text: qsTr("Why") }
        TextField {
            objectName: "rationaleField"
            Layout.fillWidth: true
            Layout.columnSpan: 2
            text: root.view.rationale
            placeholderText: qsTr("the reason, in a line")
            onTextEdited: root.view.rationale = text
        }

        FieldLabel { text: qsTr("Who") }
        TextField {
            objectName: "authorField"
            Layout.fillWidth: true
            Layout.columnSpan: 2
            text: root.view.author
            placeholderText: qsTr("your name and role")
            onTextEdited: root.view.author = text
        }

        FieldLabel { text: qsTr("From") }
        TextField {
            objectName: "fromField"
            Layout.fillWidth: true
            text: root.view.effectiveFrom
            placeholderText: "2026-10-01"
            onTextEdited: root.view.effectiveFrom = text
        }
        Unit { text: qsTr("year-month-day") }
    }

    RowLayout {
        Layout.fillWidth: true
        Layout.topMargin: Theme.gapSmall
        spacing: Theme.gap
        Button {
            objectName: "saveButton"
            text: root.view.selectedCount > 1 ? qsTr("Save for %1 zones  Ctrl+S").arg(root.view.selectedCount)
                                              : qsTr("Save  Ctrl+S")
            enabled: root.view.selectedCount > 0
            palette.button: Theme.accent
            palette.buttonText: "#ffffff"
            onClicked: root.view.save()
        }
        Button {
            objectName: "retireButton"
            text: qsTr("Retire")
            enabled: root.view.selectedCount > 0
            onClicked: root.view.retire()
            ToolTip.visible: hovered
            ToolTip.delay: 500
            ToolTip.text: qsTr("End the selected zones' targets from the date above; their history stays")
        }
        Item { Layout.fillWidth: true }
    }

    Label {
        objectName: "formError"
        Layout.fillWidth: true
        visible: root.view.formError.length > 0
        text: "✕  " + root.view.formError
        wrapMode: Text.WordWrap
        color: Theme.error
    }
    Label {
        objectName: "statusText"
        Layout.fillWidth: true
        visible: root.view.statusText.length > 0
        text: "✓  " + root.view.statusText
        wrapMode: Text.WordWrap
        color: Theme.text
    }
}
