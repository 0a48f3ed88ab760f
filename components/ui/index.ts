/* Axisline UI primitives. Server-safe unless marked (client): tabs, dialog, toast, submit-button. */
export { cx } from "./cx";
export { Badge, type BadgeProps, type BadgeTone } from "./badge";
export { Button, buttonClassName, type ButtonProps, type ButtonSize, type ButtonVariant } from "./button";
export { Card, CardDescription, CardFooter, CardHeader, CardTitle, type CardProps } from "./card";
export { Checkbox, type CheckboxProps } from "./checkbox";
export { Dialog, DialogClose, DialogContent, DialogFooter, DialogTrigger, type DialogContentProps } from "./dialog";
export { EmptyState, type EmptyStateProps } from "./empty-state";
export { FieldErrorMessage, FieldHint, type FieldError } from "./field-message";
export { FormField, type FieldControlProps, type FormFieldProps } from "./form-field";
export { AlertIcon, CautionIcon, CheckIcon, ChevronDownIcon, CloseIcon, InfoIcon, SpinnerIcon } from "./icons";
export { Input } from "./input";
export { LinkButton, type LinkButtonProps } from "./link-button";
export { Notice, type NoticeProps, type NoticeTone } from "./notice";
export { ProgressBar, progressPercent, type ProgressBarProps } from "./progress-bar";
export { RadioGroup, type RadioGroupProps, type RadioOption } from "./radio-group";
export { Select, type SelectProps } from "./select";
export { LoadingRegion, Skeleton, type LoadingRegionProps } from "./skeleton";
export { SubmitButton, type SubmitButtonProps } from "./submit-button";
export {
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableHeaderCell,
  TableRow,
  type TableCellProps,
  type TableHeaderCellProps,
  type TableProps,
} from "./table";
export { Tabs, TabsContent, TabsList, TabsTrigger, type TabsListProps } from "./tabs";
export { ShowToast, ToastButton, Toaster, useToast, type ToastInput, type ToastTone } from "./toast";
export { Textarea } from "./textarea";
export { VisuallyHidden } from "./visually-hidden";
