/**
 * A compose step that cannot be applied as asked. The message opens with the field at fault
 * (`toYear 2200 lies after …`), like every validation message of the API, and `field` names it
 * so a form can put the message beside the right input.
 */
export class ComposeStepError extends RangeError {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(`${field} ${message}`);
    this.name = "ComposeStepError";
  }
}
